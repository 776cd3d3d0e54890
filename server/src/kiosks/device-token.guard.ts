import { applyDecorators, CanActivate, createParamDecorator, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException, UseGuards } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Request } from 'express';
import { QueryTypes } from 'sequelize';
import { Public } from '../auth/auth.decorators.js';
import { hashToken } from '../common/tokens.js';
import { bearerOf, isDeviceToken } from './device-token.js';
import { Kiosk } from './models/kiosk.model.js';

export const KIOSK_UNPAIRED_MESSAGE = 'Pair this kiosk to continue.';

/** What a kiosk route knows of the kiosk calling it. */
export interface PairedKiosk {
  id: number;
  stationId: number;
  station: { id: number; galleryId: number };
}

export interface KioskRequest extends Request {
  kiosk: PairedKiosk;
}

/**
 * Lets a paired kiosk through with its own device token, read from the database on each request
 * so a revoked kiosk is refused at once. A person's access token is refused here, as a device
 * token is refused on staff routes. Kiosks poll all day, so the check is one lookup on the unique
 * token-hash key, joined to the kiosk's station.
 */
@Injectable()
export class DeviceTokenGuard implements CanActivate {
  constructor(@InjectModel(Kiosk) private readonly kiosks: typeof Kiosk) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<KioskRequest>();
    const token = bearerOf(request.headers.authorization);
    if (token && !isDeviceToken(token)) throw new ForbiddenException('Kiosk routes take a kiosk’s device token, not a person’s sign-in.');
    const [row] = token
      ? await this.kiosks.sequelize!.query<{ id: number; stationId: number; galleryId: number }>(
          'SELECT k.id, k.station_id AS stationId, s.gallery_id AS galleryId FROM kiosks k JOIN stations s ON s.id = k.station_id WHERE k.device_token_hash = ? AND k.revoked_at IS NULL',
          { replacements: [hashToken(token)], type: QueryTypes.SELECT },
        )
      : [];
    if (!row) throw new UnauthorizedException(KIOSK_UNPAIRED_MESSAGE);
    request.kiosk = { id: row.id, stationId: row.stationId, station: { id: row.stationId, galleryId: row.galleryId } };
    return true;
  }
}

/** A route for paired kiosks only: the staff guard steps aside and the device-token guard decides. */
export const KioskRoute = () => applyDecorators(Public(), UseGuards(DeviceTokenGuard));

/** The kiosk of a kiosk route. */
export const CurrentKiosk = createParamDecorator((_data: unknown, ctx: ExecutionContext) => ctx.switchToHttp().getRequest<KioskRequest>().kiosk);
