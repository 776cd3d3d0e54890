import { randomBytes } from 'node:crypto';
import { hostname } from 'node:os';
import { Injectable } from '@nestjs/common';

/**
 * Who claims work: one id per running app, written into every claim it makes. Host and process
 * say where to look when a claim hangs; the random part keeps two apps in one process apart.
 */
@Injectable()
export class JobOwner {
  readonly id = `${hostname().slice(0, 60)}:${process.pid}:${randomBytes(6).toString('hex')}`;
}
