import { Injectable, type PipeTransform } from '@nestjs/common';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import {
  badInput,
  fieldProblems,
  VALIDATION_OPTIONS,
  type FieldProblem,
} from '../common/validation.js';
import { PushDto, type PushRequest } from './dto/push.dto.js';

const PER_OPERATION = /^operations\.(\d+)\.((?:type|payload)(?:\.|$).*)$/;

/**
 * Validates a push in one pass. A fault in an operation's type or payload rejects that operation
 * only (its `problem`); a fault anywhere else means the batch cannot be answered op by op: 400.
 * The route's parameter is typed as an interface, so the global pipe leaves it to this one.
 */
@Injectable()
export class PushPipe implements PipeTransform<unknown, Promise<PushRequest>> {
  async transform(value: unknown): Promise<PushRequest> {
    const push = plainToInstance(PushDto, typeof value === 'object' && value !== null ? value : {});
    const envelope: FieldProblem[] = [];
    const perOp = new Map<number, string[]>();
    for (const problem of fieldProblems(await validate(push, VALIDATION_OPTIONS))) {
      const match = PER_OPERATION.exec(problem.field);
      if (!match) {
        envelope.push(problem);
        continue;
      }
      const index = Number(match[1]);
      perOp.set(index, [
        ...(perOp.get(index) ?? []),
        `${match[2]}: ${problem.messages.join('; ')}`,
      ]);
    }
    if (envelope.length > 0) throw badInput(envelope);
    return {
      deviceId: push.deviceId,
      operations: push.operations,
      problems: push.operations.map((_op, index) => perOp.get(index)?.join(' | ')),
    };
  }
}
