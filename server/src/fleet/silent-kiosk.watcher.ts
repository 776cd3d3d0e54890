import { Injectable, type OnModuleInit } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import type { MailContent } from '../mail/mail-templates.js';
import { MailService } from '../mail/mail.service.js';
import { UsersService } from '../users/users.service.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { KioskStates } from './kiosk-states.service.js';

type PlacedKiosk = Kiosk & { station: Station & { gallery: Gallery & { venue: Venue } } };

export interface WatchReport {
  /** Kiosks whose silence was announced in this check. */
  silent: number[];
  /** Kiosks whose return was announced in this check. */
  back: number[];
}

/**
 * Tells the technicians of a kiosk's venue when it has been silent past the offline threshold, and
 * again when it reports back. The alert is claimed on the kiosk row with a conditional update
 * before the mail is queued in the same transaction, so each goes out once however often (and on
 * however many server instances) the check runs. The timer's checks run as a singleton background
 * job: one instance at a time judges, under the `fleet-watch` lease.
 */
@Injectable()
export class SilentKioskWatcher implements OnModuleInit {
  /**
   * No kiosk could report while this server was down, so silence is judged only once a whole
   * offline threshold has passed since it started: kiosks that played throughout report in that
   * time, and a restart mails no "silent" and "back" pair.
   */
  private readonly judgesSilenceFrom: Date;

  constructor(
    @InjectModel(Kiosk) private readonly kiosks: typeof Kiosk,
    private readonly users: UsersService,
    private readonly mail: MailService,
    private readonly states: KioskStates,
    private readonly clock: Clock,
    private readonly config: ConfigService,
    private readonly sequelize: Sequelize,
    private readonly jobs: BackgroundJobs,
  ) {
    this.judgesSilenceFrom = new Date(clock.now().getTime() + states.thresholds.offlineAfterS * 1000);
  }

  onModuleInit(): void {
    this.jobs.register({
      name: 'fleet-watch',
      intervalMs: this.config.fleetWatchIntervalMs,
      singleton: true,
      run: async () => {
        const { silent, back } = await this.check();
        return silent.length + back.length;
      },
    });
  }

  async check(now: Date = this.clock.now()): Promise<WatchReport> {
    const offlineSince = new Date(now.getTime() - this.states.thresholds.offlineAfterS * 1000);
    const placed = { include: [{ model: Station, required: true, include: [{ model: Gallery, include: [{ model: Venue, attributes: ['id', 'timeZone'] }] }] }] };
    // The demo kiosk has no device behind it: it falls silent after the first start, and nobody should be mailed about it.
    const judgesSilence = now >= this.judgesSilenceFrom;
    const [silent, back] = await Promise.all([
      // A kiosk that never reported is silent since it was paired.
      !judgesSilence ? [] : this.kiosks.findAll({
        where: {
          revokedAt: null,
          demo: false,
          silenceAlertedAt: null,
          [Op.or]: [{ lastHeartbeatAt: { [Op.lte]: offlineSince } }, { lastHeartbeatAt: null, pairedAt: { [Op.lte]: offlineSince } }],
        },
        ...placed,
      }),
      this.kiosks.findAll({
        where: {
          revokedAt: null,
          silenceAlertedAt: { [Op.ne]: null },
          lastHeartbeatAt: { [Op.gt]: offlineSince },
          [Op.and]: [Sequelize.where(Sequelize.col('last_heartbeat_at'), Op.gt, Sequelize.col('silence_alerted_at'))],
        },
        ...placed,
      }),
    ]);
    const report: WatchReport = { silent: [], back: [] };
    for (const kiosk of silent as PlacedKiosk[]) {
      const since = kiosk.lastHeartbeatAt ?? kiosk.pairedAt;
      if (await this.announce(kiosk, { silenceAlertedAt: now }, { silenceAlertedAt: null }, (name, link) => ({ kind: 'kiosk-silent', name, ...where(kiosk), since, link }))) report.silent.push(kiosk.id);
    }
    for (const kiosk of back as PlacedKiosk[]) {
      const alertedAt = kiosk.silenceAlertedAt!;
      if (await this.announce(kiosk, { silenceAlertedAt: null }, { silenceAlertedAt: alertedAt }, (name, link) => ({ kind: 'kiosk-back', name, ...where(kiosk), backAt: kiosk.lastHeartbeatAt!, link }))) report.back.push(kiosk.id);
    }
    return report;
  }

  /** Moves the kiosk's alert state from `expected` to `next`; if this check won that move, queues the mail. */
  private announce(
    kiosk: PlacedKiosk,
    next: { silenceAlertedAt: Date | null },
    expected: { silenceAlertedAt: Date | null },
    content: (name: string, link: string) => MailContent,
  ): Promise<boolean> {
    return this.sequelize.transaction(async (transaction) => {
      const [moved] = await this.kiosks.update(next, { where: { id: kiosk.id, ...expected }, transaction });
      if (moved !== 1) return false;
      const link = this.mail.studioLink(`/fleet/${kiosk.id}`);
      for (const technician of await this.users.holdingAt(kiosk.station.gallery.venueId, 'technician', transaction)) {
        await this.mail.enqueue(technician.email, technician.uiLanguage, content(technician.name, link), transaction);
      }
      return true;
    });
  }
}

const where = (kiosk: PlacedKiosk) => ({ station: kiosk.station.name, gallery: kiosk.station.gallery.name, timeZone: kiosk.station.gallery.venue.timeZone });
