import {
  Catch,
  HttpException,
  HttpStatus,
  Logger,
  type ArgumentsHost,
  type ExceptionFilter,
} from '@nestjs/common';
import type { Response } from 'express';
import { QueryFailedError } from 'typeorm';
import { EngineInputError } from '../engine.js';

interface ErrorBody {
  statusCode: number;
  error: string;
  message: string;
  field?: string;
  reason?: string;
  fields?: unknown;
}

const NAMES: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
};

function body(statusCode: number, message: string, extra: Partial<ErrorBody> = {}): ErrorBody {
  return { statusCode, error: NAMES[statusCode] ?? 'Error', message, ...extra };
}

/**
 * Turns what a database constraint says into a client error, so bad input that slips past the
 * DTOs (a duplicate key, a reference to nothing) is a 4xx, never a 500. Messages of SQLite and
 * PostgreSQL are both understood.
 */
export function constraintError(error: QueryFailedError): ErrorBody | undefined {
  const text = error.message;
  const driver = error.driverError as { code?: string; detail?: string } | undefined;
  const column = /constraint failed: \w+\.(\w+)/.exec(text)?.[1];
  if (/UNIQUE constraint/.test(text) || driver?.code === '23505') {
    return body(409, `${column ?? 'value'} is already taken`, { field: column });
  }
  if (/FOREIGN KEY constraint/.test(text) || driver?.code === '23503') {
    return body(422, 'refers to a record that does not exist');
  }
  if (/NOT NULL constraint/.test(text) || driver?.code === '23502') {
    return body(400, `${column ?? 'a field'} is required`, { field: column });
  }
  if (/CHECK constraint/.test(text) || driver?.code === '23514') {
    return body(400, 'a value is out of its allowed range');
  }
  return undefined;
}

/** Body-parser failures (bad JSON, too large) carry their status and a `type`. */
export function parserError(error: unknown): ErrorBody | undefined {
  const e = error as { status?: number; type?: string; message?: string };
  if (typeof e?.type !== 'string' || typeof e.status !== 'number' || e.status >= 500) return;
  const message =
    e.type === 'entity.too.large'
      ? 'request body is too large'
      : e.type === 'entity.parse.failed'
        ? 'request body is not valid JSON'
        : (e.message ?? 'request body cannot be read');
  return body(e.status, message, { field: 'body' });
}

export function errorBody(exception: unknown): ErrorBody {
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const response = exception.getResponse();
    if (typeof response === 'object' && response !== null) {
      const r = response as Partial<ErrorBody> & { message?: unknown };
      const message = Array.isArray(r.message) ? r.message.join('; ') : String(r.message ?? '');
      return { ...body(status, message), ...r, message, statusCode: status };
    }
    return body(status, String(response));
  }
  if (exception instanceof EngineInputError) {
    return body(422, exception.message, { field: exception.field, reason: exception.reason });
  }
  if (exception instanceof QueryFailedError) {
    const known = constraintError(exception);
    if (known) return known;
  }
  return parserError(exception) ?? body(HttpStatus.INTERNAL_SERVER_ERROR, 'Internal server error');
}

@Catch()
export class ErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('Error');

  catch(exception: unknown, host: ArgumentsHost): void {
    const out = errorBody(exception);
    if (out.statusCode >= 500) this.logger.error(exception);
    const response = host.switchToHttp().getResponse<Response>();
    if (!response.headersSent) response.status(out.statusCode).json(out);
  }
}
