import { ArgumentsHost, Catch, ConflictException, HttpStatus, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';

/** What a stale save is answered with beside statusCode and message: the version saved since, and its content. */
export interface CurrentVersion {
  currentVersion: number;
}

/** Someone else saved after this edit started (the version sent is no longer the current one). */
export class VersionConflictException<Current extends CurrentVersion> extends ConflictException {
  constructor(message: string, readonly current: Current) {
    super(message);
  }
}

/**
 * The API's error bodies carry only statusCode, message and errors; a version conflict also
 * carries the current version and content, so the studio can show what changed without another
 * request.
 */
@Catch(VersionConflictException)
export class VersionConflictFilter implements ExceptionFilter {
  catch(exception: VersionConflictException<CurrentVersion>, host: ArgumentsHost): void {
    const body = { statusCode: HttpStatus.CONFLICT, message: exception.message, ...exception.current };
    host.switchToHttp().getResponse<Response>().status(HttpStatus.CONFLICT).json(body);
  }
}
