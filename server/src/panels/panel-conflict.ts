import { ArgumentsHost, Catch, ConflictException, HttpStatus, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import type { PanelConflictBody, PanelDocJSON } from '@mantlepiece/shared';

/** Someone saved the panel after this edit started; the body hands back what they saved. */
export class PanelConflictException extends ConflictException {
  constructor(readonly currentVersion: number, readonly doc: PanelDocJSON) {
    super('Someone else saved this panel after you started editing it.');
  }
}

/**
 * The API's error bodies carry only statusCode, message and errors; a conflict also carries the
 * current version and document, so the studio can show what changed without another request.
 */
@Catch(PanelConflictException)
export class PanelConflictFilter implements ExceptionFilter {
  catch(exception: PanelConflictException, host: ArgumentsHost): void {
    const body: PanelConflictBody = {
      statusCode: HttpStatus.CONFLICT,
      message: exception.message,
      currentVersion: exception.currentVersion,
      doc: exception.doc,
    };
    host.switchToHttp().getResponse<Response>().status(HttpStatus.CONFLICT).json(body);
  }
}
