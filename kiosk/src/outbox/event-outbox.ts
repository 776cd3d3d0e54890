import type { KioskEvent } from '@mantlepiece/shared/kiosk';
import type { KioskApi } from '../app/kiosk-api';
import type { KioskDb } from '../storage/kiosk-db';

/** Events sent per upload: small enough for one quick request on a slow gallery network. */
export const EVENT_BATCH = 200;
/** A kiosk offline for months keeps its newest events rather than filling the disk. */
export const EVENT_KEEP_MAX = 50_000;

export type VisitorEvent = Omit<KioskEvent, 'id' | 'at'>;

/**
 * Visitor events, written to IndexedDB as they happen with a random id, and uploaded in batches
 * when the server answers. The server stores each id once, so a batch resent after a lost answer
 * is harmless.
 */
export class EventOutbox {
  private uploading: Promise<number> | null = null;

  constructor(private readonly db: KioskDb, private readonly now: () => Date = () => new Date()) {}

  async record(event: VisitorEvent): Promise<void> {
    await this.db.put('outbox', { ...event, id: crypto.randomUUID(), at: this.now().toISOString() });
    const count = await this.db.count('outbox');
    if (count > EVENT_KEEP_MAX) {
      let cursor = await this.db.transaction('outbox', 'readwrite').store.index('byTime').openCursor();
      for (let excess = count - EVENT_KEEP_MAX; cursor && excess > 0; excess -= 1) {
        await cursor.delete();
        cursor = await cursor.continue();
      }
    }
  }

  waiting(): Promise<number> {
    return this.db.count('outbox');
  }

  /** Uploads everything waiting, oldest first; stops quietly at the first failure. Returns how many went. */
  upload(api: KioskApi): Promise<number> {
    this.uploading ??= this.uploadAll(api).finally(() => {
      this.uploading = null;
    });
    return this.uploading;
  }

  private async uploadAll(api: KioskApi): Promise<number> {
    let sent = 0;
    for (;;) {
      const batch = await this.db.getAllFromIndex('outbox', 'byTime', null, EVENT_BATCH);
      if (!batch.length) return sent;
      try {
        await api.events(batch);
      } catch {
        return sent;
      }
      const tx = this.db.transaction('outbox', 'readwrite');
      await Promise.all([...batch.map((event) => tx.store.delete(event.id)), tx.done]);
      sent += batch.length;
    }
  }
}
