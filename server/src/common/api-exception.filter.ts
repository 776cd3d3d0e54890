import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import type { ApiErrorBody } from '@mantlepiece/shared';
import { DATABASE_RETRY_AFTER_SECONDS, DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from '../database/database-unavailable.js';
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
};

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
  return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Something went wrong on the server.' };
}
