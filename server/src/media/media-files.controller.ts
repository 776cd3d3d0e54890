import { Controller, Get, Inject, NotFoundException, Param, Req, Res } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { MEDIA_STORE, renditionKey, type MediaStore } from './media-store.js';
import { IMMUTABLE, sendStoredObject, storedObject } from './stored-file-response.js';

const SHA256 = /^[0-9a-f]{64}$/;
const RENDITION_FILE = /^([1-9]\d{0,4})\.webp$/;

/** Where `<img>` tags fetch renditions; served outside /api (see configureApp) so they need no token. */
export const MEDIA_FILES_PATH = 'media/:sha256/:file';

/** Public and immutable: a URL names content by its hash. */
@ApiExcludeController()
@Public()
@Controller()
export class MediaFilesController {
  constructor(@Inject(MEDIA_STORE) private readonly store: MediaStore) {}

  @Get(MEDIA_FILES_PATH)
  async rendition(@Param('sha256') sha256: string, @Param('file') file: string, @Req() req: Request, @Res() res: Response): Promise<void> {
    const width = RENDITION_FILE.exec(file)?.[1];
    const key = SHA256.test(sha256) && width ? renditionKey(sha256, Number(width)) : null;
    const sent = key && (await sendStoredObject(req, res, storedObject(this.store, key), { 'Content-Type': 'image/webp', 'Cache-Control': IMMUTABLE, 'X-Content-Type-Options': 'nosniff' }));
    if (!sent) throw new NotFoundException('There is no such image.');
  }
}
