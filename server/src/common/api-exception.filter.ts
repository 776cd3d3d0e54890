import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import type { ApiErrorBody } from '@mantlepiece/shared';
import { DATABASE_RETRY_AFTER_SECONDS, DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from '../database/database-unavailable.js';
import { UNKNOWN_REFERENCE_MESSAGE } from './validation.js';
import { TooManyAttemptsException } from '../rate-limits/too-many-attempts.exception.js';

/** Shapes every error the API sends as ApiErrorBody; the details of a crash stay in the log. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('API');

  catch(exception: unknown, host: ArgumentsHost): void {
    const body = toErrorBody(exception);
    const databaseUnavailable = isDatabaseUnavailable(exception);
    // An outage fails every request alike: one line each, not a stack trace each.
    if (databaseUnavailable) this.logger.warn(`database unavailable: ${(exception as Error).message}`);
    else if (body.statusCode >= 500) this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    const response = host.switchToHttp().getResponse<Response>();
    if (exception instanceof TooManyAttemptsException) response.set('Retry-After', String(exception.retryAfterSeconds));
    if (databaseUnavailable) response.set('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    response.status(body.statusCode).json(body);
  }
}

/** Express's body parser fails before Nest sees the request; Nest hands its error on as the cause. */
const parserMessages: Record<string, string> = {
  'entity.parse.failed': 'The request body is not valid JSON.',
  'entity.too.large': 'The request body is too large.',
  'encoding.unsupported': 'The request body uses an encoding the server does not accept.',
  'charset.unsupported': 'The request body uses a character set the server does not accept.',
  'entity.too.deep': 'The request body is nested too deeply.',
};

/** `release_id` → `releaseId`: the field a request names for a column. */
const fieldOf = (column: string) => column.replace(/_([a-z])/g, (_match, letter: string) => letter.toUpperCase());

/**
 * The database's own refusals, as a safety net behind the services' checks: a write naming a row
 * that does not exist is the request's fault (422, naming the field), as is one that duplicates a
 * unique value (409); a row others still point at cannot go (409).
 */
function constraintErrorBody(exception: unknown): ApiErrorBody | null {
  if (exception instanceof ForeignKeyConstraintError) {
    // Sequelize types `reltype` as an enum it does not export at run time; its values are these strings.
    if (String(exception.reltype) === 'parent') return { statusCode: HttpStatus.CONFLICT, message: 'Other records still refer to this one.' };
    // MySQL's dialect lists the columns; the typings (and other dialects) give an object keyed by them.
    const columns: unknown = exception.fields;
    const fields = (Array.isArray(columns) ? columns.map(String) : Object.keys(columns ?? {})).map(fieldOf);
    return {
      statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
      message: UNKNOWN_REFERENCE_MESSAGE,
      errors: fields.map((field) => ({ path: [field], message: 'There is no such record.' })),
    };
  }
  if (exception instanceof UniqueConstraintError) return { statusCode: HttpStatus.CONFLICT, message: 'Another record already uses this value.' };
  return null;
}

export function toErrorBody(exception: unknown): ApiErrorBody {
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    const response = exception.getResponse();
    const parserType = (exception.cause as { type?: unknown } | undefined)?.type;
    if (typeof parserType === 'string' && parserMessages[parserType]) return { statusCode, message: parserMessages[parserType] };
    if (typeof response === 'string') return { statusCode, message: response };
    const { message, errors } = response as { message?: unknown; errors?: ApiErrorBody['errors'] };
    return {
      statusCode,
      message: typeof message === 'string' ? message : Array.isArray(message) ? message.join('; ') : exception.message,
      ...(errors ? { errors } : {}),
    };
  }
  if (isDatabaseUnavailable(exception)) return { statusCode: HttpStatus.SERVICE_UNAVAILABLE, message: DATABASE_UNAVAILABLE_MESSAGE };
  return constraintErrorBody(exception) ?? { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Something went wrong on the server.' };
}
