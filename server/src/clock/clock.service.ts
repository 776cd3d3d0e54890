import { Injectable } from '@nestjs/common';

/** The one source of "now" for rules that expire things, so tests can move time instead of waiting. */
@Injectable()
export class Clock {
  now(): Date {
    return new Date();
  }

  /** A moment `ms` milliseconds from now (negative for the past). */
  fromNow(ms: number): Date {
    return new Date(this.now().getTime() + ms);
  }
}
