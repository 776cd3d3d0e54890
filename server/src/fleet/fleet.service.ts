import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { FleetKioskDetail } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { pageWindow, toPage, type PageQuery } from '../common/page.js';
import { KiosksService } from '../kiosks/kiosks.service.js';
import { KioskHeartbeat } from '../kiosks/models/kiosk-heartbeat.model.js';
import { Release } from '../releases/models/release.model.js';
import { toHeartbeatView } from './fleet.presenter.js';
import { KioskStates } from './kiosk-states.service.js';

@Injectable()
export class FleetService {
  constructor(
    private readonly kiosks: KiosksService,
    private readonly states: KioskStates,
    @InjectModel(KioskHeartbeat) private readonly heartbeats: typeof KioskHeartbeat,
    @InjectModel(Release) private readonly releases: typeof Release,
  ) {}

  /** One kiosk as the Fleet page shows it, with a page of its heartbeats, newest first. */
  async kiosk(id: number, query: PageQuery, member: Member): Promise<FleetKioskDetail> {
    const view = this.states.present(await this.kiosks.get(id, member));
    const { rows, count } = await this.heartbeats.findAndCountAll({ where: { kioskId: id }, order: [['id', 'DESC']], ...pageWindow(query) });
    const releaseIds = [...new Set(rows.flatMap((row) => (row.releaseId === null ? [] : [row.releaseId])))];
    const releases = releaseIds.length ? await this.releases.findAll({ where: { id: releaseIds }, attributes: ['id', 'number'] }) : [];
    const byId = new Map(releases.map((release) => [release.id, release]));
    return { ...view, heartbeats: toPage(rows.map((row) => toHeartbeatView(row, byId)), count, query) };
  }
}
