import { ArgumentsHost, Catch, ConflictException, HttpStatus, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import type { TranslationConflictBody } from '@mantlepiece/shared';

/** Someone saved the unit after this translator started; the body hands back what they saved. */
export class TranslationConflictException extends ConflictException {
  constructor(readonly currentVersion: number, readonly text: string | null) {
    super('Someone else saved this unit after you started translating it.');
  }
}

/** Like the panel conflict: the body carries the current version and text, so no second request is needed. */
@Catch(TranslationConflictException)
export class TranslationConflictFilter implements ExceptionFilter {
  catch(exception: TranslationConflictException, host: ArgumentsHost): void {
    const body: TranslationConflictBody = {
      statusCode: HttpStatus.CONFLICT,
      message: exception.message,
      currentVersion: exception.currentVersion,
      text: exception.text,
    };
    host.switchToHttp().getResponse<Response>().status(HttpStatus.CONFLICT).json(body);
  }
}
