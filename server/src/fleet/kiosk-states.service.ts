import { Injectable } from '@nestjs/common';
import { kioskState, kioskStateThresholds, type FleetKioskView, type FleetThresholdsView, type KioskView } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';

/** Judges kiosks by their last heartbeat against the venue's thresholds, at the clock's now. */
@Injectable()
export class KioskStates {
  readonly thresholds: FleetThresholdsView;

  constructor(
    private readonly clock: Clock,
    config: ConfigService,
  ) {
    this.thresholds = { heartbeatIntervalS: config.heartbeatIntervalS, ...kioskStateThresholds(config.heartbeatIntervalS, config.kioskOfflineAfterS) };
  }

  present<T extends KioskView>(view: T): T & Pick<FleetKioskView, 'state' | 'playsLiveRelease'> {
    return {
      ...view,
      state: kioskState(view.lastHeartbeatAt, this.clock.now(), this.thresholds),
      playsLiveRelease: view.releasePlaying !== null && view.releasePlaying.id === view.releaseLive?.id,
    };
  }
}
