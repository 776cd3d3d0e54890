import { Body, Controller, Get, Headers, HttpCode, HttpStatus, Ip, NotFoundException, Param, Post, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { IMMUTABLE, sendStoredObject } from '../media/stored-file-response.js';
import { KioskVenueQuery } from '../venues/dto/venue.dto.js';
import { VenuesService } from '../venues/venues.service.js';
import { CurrentKiosk, KioskRoute, PairedOrUnpairedKioskRoute, type PairedKiosk } from './device-token.guard.js';
import { HeartbeatDto, KioskEventsDto } from './dto/kiosk-report.dto.js';
import { KioskReleasesService } from './kiosk-releases.service.js';
import { answerManifestPoll } from './manifest-poll.js';
import { CompletePairingDto } from './dto/pairing.dto.js';
import { KiosksService } from './kiosks.service.js';
import { PairingService } from './pairing.service.js';
import { ApiAnswer, ApiAnswerSent, ApiFileAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

const SHA256 = /^[0-9a-f]{64}$/;

/** What a kiosk calls: pairing without a credential, everything else with its device token. */
@ApiTags('kiosk')
@Controller('kiosk')
export class KioskController {
  constructor(
    private readonly pairing: PairingService,
    private readonly kiosks: KiosksService,
    private readonly releases: KioskReleasesService,
    private readonly venues: VenuesService,
  ) {}

  /**
   * A venue's name and languages are no secret. A paired kiosk is answered its own venue; an
   * unpaired one the venue its install URL names, else the only venue there is, and 204 when there
   * are several and none is named: the kiosk then shows its neutral pairing screen.
   */
  @PairedOrUnpairedKioskRoute()
  @ApiAnswerSent('KioskVenueView')
  @ApiNoBody(HttpStatus.NO_CONTENT, 'Several venues and none named: the kiosk shows its neutral pairing screen.')
  @Get('venue')
  async venue(@CurrentKiosk() kiosk: PairedKiosk | undefined, @Query() query: KioskVenueQuery, @Res() res: Response): Promise<void> {
    const venue = kiosk ? await this.venues.forPairedKiosk(kiosk.station.galleryId) : await this.venues.forUnpairedKiosk(query.slug);
    if (venue) res.json(venue);
    else res.status(HttpStatus.NO_CONTENT).end();
  }

  @Public()
  @ApiAnswer('PairStartResponse', { status: HttpStatus.CREATED })
  @Post('pair/start')
  start(@Ip() ip: string) {
    return this.pairing.start(ip);
  }

  @Public()
  @ApiAnswerSent('KioskCredential')
  @ApiAnswerSent('PairCompleteWaiting', { status: HttpStatus.ACCEPTED, description: 'Not paired yet: poll again.' })
  @Post('pair/complete')
  async complete(@Body() dto: CompletePairingDto, @Res({ passthrough: true }) res: Response) {
    const answer = await this.pairing.complete(dto.pollToken);
    res.status('status' in answer ? HttpStatus.ACCEPTED : HttpStatus.OK);
    return answer;
  }

  /**
   * The gallery's live signed manifest (answerManifestPoll says how). A paired kiosk's poll is
   * mostly answered before Nest (answerManifestPollsFirst); this route answers the rest, with the
   * same guard and answer.
   */
  @ApiBearerAuth()
  @KioskRoute()
  @ApiAnswerSent('KioskManifestResponse')
  @ApiNoBody(HttpStatus.NO_CONTENT, 'Nothing is published for the gallery yet.')
  @ApiNoBody(HttpStatus.NOT_MODIFIED, 'Unchanged since the ETag the kiosk sent.')
  @Get('manifest')
  async manifest(@CurrentKiosk() kiosk: PairedKiosk, @Headers('if-none-match') ifNoneMatch: string | undefined, @Res() res: Response): Promise<void> {
    answerManifestPoll(res, await this.releases.liveManifest(kiosk), ifNoneMatch);
  }

  /**
   * Named by content, so immutable; a byte range resumes a broken download. From object storage
   * the kiosk is sent to a short-lived presigned URL of the bucket (it checks every hash anyway).
   */
  @ApiBearerAuth()
  @KioskRoute()
  @ApiFileAnswer('*/*', 'The file, named by its SHA-256.')
  @ApiFileAnswer('*/*', 'The byte range asked for.', { status: HttpStatus.PARTIAL_CONTENT })
  @ApiNoBody(HttpStatus.FOUND, 'Sent to a short-lived presigned URL of the object store.')
  @Get('files/:sha256')
  async file(@CurrentKiosk() kiosk: PairedKiosk, @Param('sha256') sha256: string, @Req() req: Request, @Res() res: Response): Promise<void> {
    if (!SHA256.test(sha256)) throw new NotFoundException('This gallery has no such file.');
    const { mime, redirectTo, source } = await this.releases.file(kiosk.station.galleryId, sha256);
    if (redirectTo) {
      // The URL outlives no more than its signature: nothing may keep the redirect.
      res.set('Cache-Control', 'no-store').redirect(HttpStatus.FOUND, redirectTo);
      return;
    }
    const sent = await sendStoredObject(req, res, source, { 'Content-Type': mime, 'Cache-Control': IMMUTABLE, 'X-Content-Type-Options': 'nosniff', ETag: `"${sha256}"` });
    if (!sent) throw new NotFoundException('This gallery has no such file.');
  }

  @ApiBearerAuth()
  @KioskRoute()
  @ApiNoBody()
  @Post('heartbeat')
  @HttpCode(HttpStatus.NO_CONTENT)
  heartbeat(@CurrentKiosk() kiosk: PairedKiosk, @Body() dto: HeartbeatDto) {
    return this.kiosks.recordHeartbeat(kiosk, dto);
  }

  @ApiBearerAuth()
  @KioskRoute()
  @ApiAnswer('EventsResponse')
  @Post('events')
  @HttpCode(HttpStatus.OK)
  events(@CurrentKiosk() kiosk: PairedKiosk, @Body() dto: KioskEventsDto) {
    return this.kiosks.recordEvents(kiosk, dto);
  }
}
