import { Controller, Get, Inject, NotFoundException, Param, Res } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { MEDIA_STORE, renditionKey, type MediaStore } from './media-store.js';

const SHA256 = /^[0-9a-f]{64}$/;
const RENDITION_FILE = /^([1-9]\d{0,4})\.webp$/;

/** Where `<img>` tags fetch renditions; served outside /api (see configureApp) so they need no token. */
export const MEDIA_FILES_PATH = 'media/:sha256/:file';

/**
 * Public and immutable: a URL names content by its hash, so what it returns never changes and
 * browsers, kiosks and a CDN may cache it for a year.
 */
@ApiExcludeController()
@Public()
@Controller()
export class MediaFilesController {
  constructor(@Inject(MEDIA_STORE) private readonly store: MediaStore) {}

  @Get(MEDIA_FILES_PATH)
  async rendition(@Param('sha256') sha256: string, @Param('file') file: string, @Res() res: Response): Promise<void> {
    const width = RENDITION_FILE.exec(file)?.[1];
    const data = SHA256.test(sha256) && width ? await this.store.get(renditionKey(sha256, Number(width))) : null;
    if (!data) throw new NotFoundException('There is no such image.');
    res
      .set({
        'Content-Type': 'image/webp',
        'Cache-Control': 'public, max-age=31536000, immutable',
        'X-Content-Type-Options': 'nosniff',
        'Content-Length': String(data.length),
      })
      .send(data);
  }
}
