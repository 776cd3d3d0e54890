import { Body, Controller, Get, Headers, HttpCode, HttpStatus, Ip, NotFoundException, Param, Post, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { KioskManifestResponse } from '@mantlepiece/shared';
import { Public } from '../auth/auth.decorators.js';
import { CurrentKiosk, KioskRoute, type KioskRequest } from './device-token.guard.js';
import { HeartbeatDto, KioskEventsDto } from './dto/kiosk-report.dto.js';
import { CompletePairingDto } from './dto/pairing.dto.js';
import { KiosksService } from './kiosks.service.js';
import { PairingService } from './pairing.service.js';

const SHA256 = /^[0-9a-f]{64}$/;

type PairedKiosk = KioskRequest['kiosk'];

/** What a kiosk calls: pairing without a credential, everything else with its device token. */
@ApiTags('kiosk')
@Controller('kiosk')
export class KioskController {
  constructor(
    private readonly pairing: PairingService,
    private readonly kiosks: KiosksService,
  ) {}

  @Public()
  @Post('pair/start')
  start(@Ip() ip: string) {
    return this.pairing.start(ip);
  }

  @Public()
  @Post('pair/complete')
  async complete(@Body() dto: CompletePairingDto, @Res({ passthrough: true }) res: Response) {
    const answer = await this.pairing.complete(dto.pollToken);
    res.status('status' in answer ? HttpStatus.ACCEPTED : HttpStatus.OK);
    return answer;
  }

  /** Revalidated by ETag: a kiosk polling an unchanged publication gets 304 and no body. */
  @ApiBearerAuth()
  @KioskRoute()
  @Get('manifest')
  async manifest(@CurrentKiosk() kiosk: PairedKiosk, @Headers('if-none-match') ifNoneMatch: string | undefined, @Res() res: Response): Promise<void> {
    const { etag, ...answer } = await this.kiosks.liveManifest(kiosk);
    res.set({ ETag: etag, 'Cache-Control': 'no-cache' });
    if (ifNoneMatch?.split(',').some((tag) => tag.trim() === etag)) {
      res.status(HttpStatus.NOT_MODIFIED).end();
      return;
    }
    res.json(answer satisfies KioskManifestResponse);
  }

  /** Named by content, so immutable; a byte range resumes a broken download. */
  @ApiBearerAuth()
  @KioskRoute()
  @Get('files/:sha256')
  async file(@CurrentKiosk() kiosk: PairedKiosk, @Param('sha256') sha256: string, @Req() req: Request, @Res() res: Response): Promise<void> {
    if (!SHA256.test(sha256)) throw new NotFoundException('This gallery has no such file.');
    const { data, mime } = await this.kiosks.file(kiosk, sha256);
    res.set({ 'Content-Type': mime, 'Cache-Control': 'public, max-age=31536000, immutable', 'Accept-Ranges': 'bytes', 'X-Content-Type-Options': 'nosniff', ETag: `"${sha256}"` });
    const ranges = req.headers.range ? req.range(data.length, { combine: true }) : undefined;
    if (ranges === -1) {
      res.status(HttpStatus.REQUESTED_RANGE_NOT_SATISFIABLE).set('Content-Range', `bytes */${data.length}`).end();
      return;
    }
    if (Array.isArray(ranges) && ranges.type === 'bytes' && ranges.length === 1) {
      const { start, end } = ranges[0]!;
      res.status(HttpStatus.PARTIAL_CONTENT).set({ 'Content-Range': `bytes ${start}-${end}/${data.length}`, 'Content-Length': String(end - start + 1) }).end(data.subarray(start, end + 1));
      return;
    }
    res.set('Content-Length', String(data.length)).end(data);
  }

  @ApiBearerAuth()
  @KioskRoute()
  @Post('heartbeat')
  @HttpCode(HttpStatus.NO_CONTENT)
  heartbeat(@CurrentKiosk() kiosk: PairedKiosk, @Body() dto: HeartbeatDto) {
    return this.kiosks.recordHeartbeat(kiosk, dto);
  }

  @ApiBearerAuth()
  @KioskRoute()
  @Post('events')
  @HttpCode(HttpStatus.OK)
  events(@CurrentKiosk() kiosk: PairedKiosk, @Body() dto: KioskEventsDto) {
    return this.kiosks.recordEvents(kiosk, dto);
  }
}
