import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { isUUID } from 'class-validator';
import { badInput } from './validation.js';

/** Route ids are UUIDs; anything else is a 400 naming the parameter, never a lookup. */
@Injectable()
export class UuidPipe implements PipeTransform<string, string> {
  transform(value: string, { data }: ArgumentMetadata): string {
    if (isUUID(value)) return value;
    const field = data ?? 'id';
    throw badInput([{ field, messages: [`${field} must be a UUID`] }]);
  }
}

export const uuidParam = new UuidPipe();
