import { Injectable, type PipeTransform } from '@nestjs/common';
import { schemaProblems } from '../common/schemas.js';
import { badInput } from '../common/validation.js';
import { PAYLOADS, pushSchema, type OperationType, type PushRequest } from './dto/push.dto.js';

/**
 * Validates a push. A fault in an operation's type or payload rejects that operation only (its
 * `problem`); a fault anywhere else means the batch cannot be answered op by op: 400. The route's
 * parameter is typed as an interface, so the global pipe leaves it to this one.
 */
@Injectable()
export class PushPipe implements PipeTransform<unknown, PushRequest> {
  transform(value: unknown): PushRequest {
    const envelope = pushSchema.safeParse(value);
    if (!envelope.success) throw badInput(schemaProblems(envelope.error));
    const operations = envelope.data.operations.map((op) => {
      const type = String(op.type) as OperationType;
      const schema = Object.hasOwn(PAYLOADS, type) ? PAYLOADS[type] : undefined;
      const payload = schema?.safeParse(op.payload);
      const problem = !schema
        ? `type: must be one of ${Object.keys(PAYLOADS).join(', ')}`
        : payload?.success
          ? undefined
          : schemaProblems(payload!.error, 'payload')
              .map((p) => `${p.field}: ${p.messages.join('; ')}`)
              .join(' | ');
      return { op: { ...op, type, payload: payload?.data ?? {} }, problem };
    });
    return {
      deviceId: envelope.data.deviceId,
      operations: operations.map((o) => o.op),
      problems: operations.map((o) => o.problem),
    };
  }
}
