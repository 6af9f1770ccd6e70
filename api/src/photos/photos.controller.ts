import { createReadStream } from 'node:fs';
import {
  Controller,
  Get,
  Injectable,
  Param,
  Put,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
  type ArgumentMetadata,
  type PipeTransform,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Response } from 'express';
import { memoryStorage } from 'multer';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { badInput } from '../common/validation.js';
import type { Photo } from './entities/photo.entity.js';
import { MAX_PHOTO_BYTES, PhotosService } from './photos.service.js';

/** Only a lowercase hex SHA-256 can name a photo, which also shuts out any path tricks. */
@Injectable()
class Sha256Pipe implements PipeTransform<string, string> {
  transform(value: string, { data }: ArgumentMetadata): string {
    if (/^[0-9a-f]{64}$/.test(value)) return value;
    throw badInput([
      { field: data ?? 'sha256', messages: ['sha256 must be 64 lowercase hex digits'] },
    ]);
  }
}

@Controller('photos')
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Put(':sha256')
  @Roles('inspector', 'supervisor', 'quality')
  @UseInterceptors(
    FileInterceptor('file', {
      storage: memoryStorage(),
      limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 0, parts: 1 },
    }),
  )
  async upload(
    @CurrentUser() user: AuthUser,
    @Param('sha256', Sha256Pipe) sha256: string,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<Pick<Photo, 'sha256' | 'mime' | 'bytes'>> {
    const { photo, created } = await this.photos.store(user.id, sha256, file?.buffer);
    response.status(created ? 201 : 200);
    return { sha256: photo.sha256, mime: photo.mime, bytes: photo.bytes };
  }

  @Get(':sha256')
  @AnyRole()
  async download(
    @Param('sha256', Sha256Pipe) sha256: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const photo = await this.photos.find(sha256);
    // Content-addressed, so a copy can be kept for good, but only by this person's browser.
    response.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
    return new StreamableFile(createReadStream(this.photos.file(sha256)), {
      type: photo.mime,
      length: photo.bytes,
    });
  }
}
