import { HttpException, HttpStatus } from '@nestjs/common';

/** A 429 that says when to try again, in its message and in a Retry-After header. */
export class TooManyAttemptsException extends HttpException {
  constructor(message: string, readonly retryAfterSeconds: number) {
    super({ statusCode: HttpStatus.TOO_MANY_REQUESTS, message }, HttpStatus.TOO_MANY_REQUESTS);
  }
}

/** "5 minutes", "40 seconds": how long to wait, rounded up. */
export function waitText(seconds: number): string {
  if (seconds > 90) {
    const minutes = Math.ceil(seconds / 60);
    return `${minutes} minute${minutes === 1 ? '' : 's'}`;
  }
  return `${seconds} second${seconds === 1 ? '' : 's'}`;
}
