import { Module } from '@nestjs/common';
import { KioskStates } from './kiosk-states.service.js';

/** Apart from FleetModule so the kiosks module can judge its list without importing the fleet's routes. */
@Module({ providers: [KioskStates], exports: [KioskStates] })
export class FleetStatesModule {}
