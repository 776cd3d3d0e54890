import { applyDecorators, CanActivate, createParamDecorator, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException, UseGuards } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Request } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { hashToken } from '../common/tokens.js';
import { Station } from '../venues/models/station.model.js';
import { bearerOf, isDeviceToken } from './device-token.js';
import { Kiosk } from './models/kiosk.model.js';

export const KIOSK_UNPAIRED_MESSAGE = 'Pair this kiosk to continue.';

export interface KioskRequest extends Request {
  kiosk: Kiosk & { station: Station };
}

/**
 * Lets a paired kiosk through with its own device token, read from the database on each request
 * so a revoked kiosk is refused at once. A person's access token is refused here, as a device
 * token is refused on staff routes.
 */
@Injectable()
export class DeviceTokenGuard implements CanActivate {
  constructor(@InjectModel(Kiosk) private readonly kiosks: typeof Kiosk) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<KioskRequest>();
    const token = bearerOf(request.headers.authorization);
    if (token && !isDeviceToken(token)) throw new ForbiddenException('Kiosk routes take a kiosk’s device token, not a person’s sign-in.');
    const kiosk = token
      ? await this.kiosks.findOne({ where: { deviceTokenHash: hashToken(token), revokedAt: null }, include: [Station] })
      : null;
    if (!kiosk?.station) throw new UnauthorizedException(KIOSK_UNPAIRED_MESSAGE);
    request.kiosk = kiosk as KioskRequest['kiosk'];
    return true;
  }
}

/** A route for paired kiosks only: the staff guard steps aside and the device-token guard decides. */
export const KioskRoute = () => applyDecorators(Public(), UseGuards(DeviceTokenGuard));

/** The kiosk of a kiosk route. */
export const CurrentKiosk = createParamDecorator((_data: unknown, ctx: ExecutionContext) => ctx.switchToHttp().getRequest<KioskRequest>().kiosk);
