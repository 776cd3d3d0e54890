import { applyDecorators, CanActivate, createParamDecorator, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException, UseGuards } from '@nestjs/common';
import type { Request } from 'express';
import { Public } from '../auth/auth.decorators.js';
import type { PublicationVersion } from '../releases/publications.service.js';
import { credentialOf } from './device-token.js';
import { PairedKioskReader } from './paired-kiosk-reader.js';

export const KIOSK_UNPAIRED_MESSAGE = 'Pair this kiosk to continue.';

/** What a kiosk route knows of the kiosk calling it. */
export interface PairedKiosk {
  id: number;
  stationId: number;
  station: { id: number; galleryId: number };
  /** The gallery's latest publication as last signed, null before the first: what the manifest poll checks its kept answer against. */
  latestPublication: PublicationVersion | null;
}

export interface KioskRequest extends Request {
  kiosk: PairedKiosk;
}

/**
 * Lets a paired kiosk through with its own device token, read from the database for each request
 * (by a read that began after the request arrived, shared with the polls that came meanwhile) so
 * a revoked kiosk is refused at once. A person's access token is refused here, as a device
 * token is refused on staff routes. Kiosks poll all day, so this is the poll's only database read
 * while the gallery's manifest is unchanged.
 */
@Injectable()
export class DeviceTokenGuard implements CanActivate {
  constructor(private readonly pairedKiosks: PairedKioskReader) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<KioskRequest>();
    const credential = credentialOf(request.headers.authorization);
    if (credential.kind === 'person') throw new ForbiddenException('Kiosk routes take a kiosk’s device token, not a person’s sign-in.');
    const kiosk = credential.kind === 'device' ? await this.pairedKiosks.read(credential.token) : undefined;
    if (!kiosk) throw new UnauthorizedException(KIOSK_UNPAIRED_MESSAGE);
    request.kiosk = kiosk;
    return true;
  }
}

/** A route for paired kiosks only: the staff guard steps aside and the device-token guard decides. */
export const KioskRoute = () => applyDecorators(Public(), UseGuards(DeviceTokenGuard));

/**
 * A caller without a device token (an unpaired kiosk, or anyone else on a public route) is let
 * through as unpaired; a kiosk sending its device token must be paired with it.
 */
@Injectable()
export class OptionalDeviceTokenGuard extends DeviceTokenGuard {
  override async canActivate(context: ExecutionContext): Promise<boolean> {
    return credentialOf(context.switchToHttp().getRequest<Request>().headers.authorization).kind !== 'device' || super.canActivate(context);
  }
}

/** A public route that answers a paired kiosk (its device token sent) for itself. */
export const PairedOrUnpairedKioskRoute = () => applyDecorators(Public(), UseGuards(OptionalDeviceTokenGuard));

/** The kiosk of a kiosk route; undefined on a route that also takes unpaired kiosks, for one of those. */
export const CurrentKiosk = createParamDecorator((_data: unknown, ctx: ExecutionContext) => ctx.switchToHttp().getRequest<KioskRequest>().kiosk);
