import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ForeignKeyConstraintError, Op, UniqueConstraintError, type Transaction, type WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { canonicalLanguageTags, DELETION_GRACE_MS, type MediaPage, type MediaUsageView, type MediaView } from '@mantlepiece/shared';
import { personAt, rolesAnywhere, scopeWhere, venueScope, type Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { dateOnlyOf } from '../common/date-only.js';
import { likePattern, orderOf } from '../common/list-query.js';
import { pageWindow, toPage } from '../common/page.js';
import { invalidField } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { PanelMediaUsage } from '../panels/models/panel-media-usage.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Story } from '../stories/models/story.model.js';
import type { User } from '../users/models/user.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { venueForNewWork } from '../venues/venue-for-new-work.js';
import type { ListMediaQuery, UpdateMediaDto } from './dto/media.dto.js';
import { ImageProcessing, MIME_TYPES, sniffImageKind, type ImageKind, type InspectedImage, type ProcessedImage } from './image-processing.js';
import { MEDIA_KEEPERS, mediaLibraryCan } from './media-policy.js';
import { toMediaView } from './media.presenter.js';
import { MEDIA_STORE, originalKey, type MediaStore } from './media-store.js';
import { MediaAltText } from './models/media-alt-text.model.js';
import { MediaAsset } from './models/media-asset.model.js';
import { MediaRendition } from './models/media-rendition.model.js';
import { RenditionsWorker } from './renditions.worker.js';

const DAY_MS = 86_400_000;

/** What an image id of no reachable image answers, one missing or of another venue alike. */
export const NO_SUCH_IMAGE = 'There is no such image.';
const NOT_RESTORABLE = `There is no deleted image to restore: a deleted image can be restored for ${DELETION_GRACE_MS / 60_000} minutes.`;

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

/** An image of an upload that the library does not have yet, decoded and ready to store. */
interface NewImage {
  sha256: string;
  kind: ImageKind;
  filename: string;
  processed: ProcessedImage;
}

/** Multer reads the name in a multipart header as Latin-1; browsers send UTF-8. Path parts and control characters go. */
function filenameOf(file: UploadedFile): string {
  const decoded = Buffer.from(file.originalname, 'latin1').toString('utf8');
  const name = (decoded.includes('\ufffd') ? file.originalname : decoded).split(/[\\/]/).pop() ?? '';
  return name.replace(/\p{Cc}/gu, '').trim().slice(0, 255) || 'image';
}

@Injectable()
export class MediaService {
  constructor(
    @InjectModel(MediaAsset) private readonly assets: typeof MediaAsset,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    @InjectModel(MediaRendition) private readonly renditions: typeof MediaRendition,
    @InjectModel(MediaAltText) private readonly altTexts: typeof MediaAltText,
    @InjectModel(PanelMediaUsage) private readonly usages: typeof PanelMediaUsage,
    @InjectModel(Panel) private readonly panels: typeof Panel,
    @Inject(MEDIA_STORE) private readonly store: MediaStore,
    private readonly images: ImageProcessing,
    private readonly renditionsWorker: RenditionsWorker,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /**
   * All or nothing: every file is checked and every new image decoded before any is stored, so a
   * refused upload leaves nothing behind; the rows go in one transaction, and a failure there
   * takes back the files this upload wrote. Stored once per content and venue: the same bytes
   * uploaded again at a venue give the asset it has. The answer comes once the originals are kept; a new image's
   * renditions are pending until the renditions worker has made them.
   */
  async upload(uploader: User, files: UploadedFile[], venueId?: number): Promise<MediaView[]> {
    if (!files?.length) {
      throw invalidField(['file'], 'Choose at least one image to upload.');
    }
    const venue = await venueForNewWork(this.venues, uploader, MEDIA_KEEPERS, venueId);
    const named = files.map((file) => ({ buffer: file.buffer, filename: filenameOf(file) }));
    const inspected: InspectedImage[] = [];
    for (const file of named) inspected.push(await this.images.inspect(file.buffer, file.filename));
    // An image deleted and not yet purged keeps its place in the venue's library: uploading it again brings it back.
    await this.assets.restore({ where: { venueId: venue.id, sha256: inspected.map((image) => image.sha256) } });
    const known = await this.idsOf(venue.id, inspected.map((image) => image.sha256));
    const fresh = new Map<string, NewImage>();
    for (const [index, { kind, sha256 }] of inspected.entries()) {
      if (known.has(sha256) || fresh.has(sha256)) continue;
      const { buffer, filename } = named[index]!;
      fresh.set(sha256, { sha256, kind, filename, processed: await this.images.process(buffer, filename, kind) });
    }
    const images = [...fresh.values()];
    const written = await this.writeFiles(images);
    let created: Map<string, number>;
    try {
      created = await this.recordAssets(uploader, venue.id, images);
    } catch (error) {
      await this.removeUnclaimed(written);
      throw error;
    }
    if (images.length > 0) this.renditionsWorker.kick();
    return this.viewsOf(inspected.map(({ sha256 }) => known.get(sha256) ?? created.get(sha256)!), uploader);
  }

  /**
   * Keeps again, without metadata, the originals stored before uploads were kept that way (the CLI's
   * `strip-originals`); an original already clean is left as it is, so running it twice changes
   * nothing. Returns how many it re-encoded.
   */
  async stripStoredOriginals(): Promise<number> {
    let stripped = 0;
    for (let after = 0; ;) {
      const batch = await this.assets.findAll({ where: { id: { [Op.gt]: after } }, attributes: ['id', 'sha256'], order: [['id', 'ASC']], limit: 100 });
      if (batch.length === 0) return stripped;
      for (const { id, sha256 } of batch) {
        const data = await this.store.get(originalKey(sha256));
        const kind = data && sniffImageKind(data);
        if (!data || !kind || !(await this.images.carriesMetadata(data))) continue;
        const clean = await this.images.stripMetadata(data, kind);
        await this.store.put(originalKey(sha256), clean);
        await this.assets.update({ bytes: clean.length }, { where: { id } });
        stripped += 1;
      }
      after = batch.at(-1)!.id;
    }
  }

  /** The Media library of the member's venues (or the one asked for): searched, filtered, sorted and paged by the database. */
  async list(query: ListMediaQuery, member: Member): Promise<MediaPage> {
    const conditions: WhereOptions<MediaAsset>[] = [scopeWhere(venueScope(member))];
    if (query.venueId) conditions.push({ venueId: query.venueId });
    if (query.q) {
      const pattern = likePattern(query.q);
      conditions.push({ [Op.or]: [{ originalFilename: { [Op.like]: pattern } }, { credit: { [Op.like]: pattern } }] });
    }
    if (query.missing === 'alt') {
      conditions.push(Sequelize.literal("NOT EXISTS (SELECT 1 FROM `media_alt_texts` AS `alt` WHERE `alt`.`media_asset_id` = `MediaAsset`.`id` AND `alt`.`text` <> '')"));
    }
    if (query.missing === 'credit') conditions.push({ [Op.or]: [{ credit: null }, { credit: '' }] });
    if (query.expiringWithinDays !== undefined) {
      conditions.push({ licenceExpiresOn: { [Op.ne]: null, [Op.lte]: dateOnlyOf(this.clock.fromNow(query.expiringWithinDays * DAY_MS)) } });
    }
    const { rows, count } = await this.assets.findAndCountAll({
      where: { [Op.and]: conditions },
      attributes: ['id'],
      order: orderOf(query.sort, { filename: 'originalFilename' }),
      ...pageWindow(query),
    });
    const uploader = query.venueId ? personAt(member, query.venueId) : { id: member.id, roles: rolesAnywhere(member) };
    return { ...toPage(await this.viewsOf(rows.map((row) => row.id), member), count, query), can: mediaLibraryCan(uploader) };
  }

  async get(id: number, member: Member): Promise<MediaView> {
    withinReach(member, await this.assets.findByPk(id, { attributes: ['id', 'venueId'] }), NO_SUCH_IMAGE);
    const [view] = await this.viewsOf([id], member);
    if (!view) throw new NotFoundException(NO_SUCH_IMAGE);
    return view;
  }

  /** Credit, licence, expiry and alt text; an alt text set to "" removes that locale's. */
  async updateDetails(id: number, dto: UpdateMediaDto, member: Member): Promise<MediaView> {
    await this.sequelize.transaction(async (transaction) => {
      const asset = await this.lockAsset(id, member, transaction);
      if (dto.credit !== undefined) asset.credit = dto.credit?.trim() || null;
      if (dto.licence !== undefined) {
        asset.licenceKind = dto.licence?.kind ?? null;
        asset.licenceSpdxId = dto.licence?.kind === 'spdx' ? dto.licence.id : null;
        asset.licenceHolder = dto.licence?.kind === 'all-rights-reserved' ? dto.licence.holder.trim() : null;
      }
      if (dto.licenceExpiresOn !== undefined) asset.licenceExpiresOn = dto.licenceExpiresOn;
      await asset.save({ transaction });
      if (dto.alt) await this.setAltTexts(id, dto.alt, transaction);
    });
    return this.get(id, member);
  }

  /**
   * Refused while any panel shows the image; the answer says where. The image leaves the library
   * at once but keeps its row and files, so `restoreAsset` can bring it back within the deletion
   * grace; the deleted-items job purges it after.
   */
  async deleteAsset(id: number, member: Member): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const found = await this.lockAsset(id, member, transaction);
      const usedIn = await this.usageOf([id], transaction);
      if (usedIn.length > 0) throw inUse(usedIn);
      await this.assets.update({ deletedAt: this.clock.now() }, { where: { id: found.id }, transaction });
    });
  }

  /** Brings back an image deleted within the grace, as it was; one deleted longer ago answers as missing. */
  async restoreAsset(id: number, member: Member): Promise<MediaView> {
    await this.sequelize.transaction(async (transaction) => {
      const asset = withinReach(member, await this.assets.findByPk(id, { paranoid: false, transaction, lock: transaction.LOCK.UPDATE }), NOT_RESTORABLE);
      actingAt(member, asset.venueId, MEDIA_KEEPERS);
      if (asset.deletedAt === null) throw new ConflictException('This image is not deleted.');
      if (asset.deletedAt.getTime() <= this.clock.now().getTime() - DELETION_GRACE_MS) throw new NotFoundException(NOT_RESTORABLE);
      await this.assets.update({ deletedAt: null }, { where: { id }, paranoid: false, transaction });
    });
    return this.get(id, member);
  }

  /**
   * Removes for good the images deleted before `cutoff`, with their files unless another venue's
   * image of the same bytes shares them; returns how many. One a deleted panel (not yet purged)
   * still names waits for the next pass.
   */
  async purgeDeleted(cutoff: Date): Promise<number> {
    const expired = await this.assets.findAll({ where: { deletedAt: { [Op.lt]: cutoff } }, attributes: ['id'], paranoid: false, limit: 20 });
    let purged = 0;
    for (const { id } of expired) {
      const removed = await this.sequelize.transaction(async (transaction) => {
        const asset = await this.assets.findOne({ where: { id, deletedAt: { [Op.lt]: cutoff } }, paranoid: false, transaction, lock: transaction.LOCK.UPDATE });
        if (!asset) return null;
        const keys = (await this.renditions.findAll({ where: { mediaAssetId: id }, transaction })).map((rendition) => rendition.storeKey);
        try {
          await asset.destroy({ force: true, transaction });
        } catch (error) {
          if (error instanceof ForeignKeyConstraintError) return null;
          throw error;
        }
        if (await this.assets.count({ where: { sha256: asset.sha256 }, paranoid: false, transaction }) > 0) return [];
        return [originalKey(asset.sha256), ...keys];
      });
      if (removed === null) continue;
      purged += 1;
      // After the commit: a rolled-back purge must not lose files.
      for (const key of removed) await this.store.remove(key);
    }
    return purged;
  }

  /** Asset ids by content hash, for the hashes the venue's library has. */
  private async idsOf(venueId: number, sha256s: string[], transaction?: Transaction): Promise<Map<string, number>> {
    if (sha256s.length === 0) return new Map();
    const rows = await this.assets.findAll({ where: { venueId, sha256: [...new Set(sha256s)] }, attributes: ['id', 'sha256'], transaction });
    return new Map(rows.map((row) => [row.sha256, row.id]));
  }

  /** Writes each image's original (its renditions are the renditions worker's); returns the keys it wrote that were not there before. */
  private async writeFiles(images: NewImage[]): Promise<{ sha256: string; key: string }[]> {
    const written: { sha256: string; key: string }[] = [];
    try {
      for (const { sha256, processed } of images) {
        const key = originalKey(sha256);
        const existed = await this.store.exists(key);
        await this.store.put(key, processed.original);
        if (!existed) written.push({ sha256, key });
      }
    } catch (error) {
      await this.removeUnclaimed(written);
      throw error;
    }
    return written;
  }

  /**
   * The asset and rendition rows of every new image, in one transaction. The same file uploaded
   * twice at once: the first upload's row stands, and the second, on its unique-key error, takes it.
   */
  private async recordAssets(uploader: User | null, venueId: number, images: NewImage[]): Promise<Map<string, number>> {
    if (images.length === 0) return new Map();
    const record = () => this.sequelize.transaction((transaction) => this.createAssets(uploader, venueId, images, transaction));
    try {
      return await record();
    } catch (error) {
      if (error instanceof UniqueConstraintError) return record();
      throw error;
    }
  }

  private async createAssets(uploader: User | null, venueId: number, images: NewImage[], transaction: Transaction): Promise<Map<string, number>> {
    const ids = await this.idsOf(venueId, images.map((image) => image.sha256), transaction);
    for (const { sha256, kind, filename, processed } of images) {
      if (ids.has(sha256)) continue;
      const asset = await this.assets.create(
        {
          venueId,
          sha256,
          originalFilename: filename,
          mime: MIME_TYPES[kind],
          width: processed.width,
          height: processed.height,
          bytes: processed.original.length,
          placeholder: processed.placeholder,
          uploadedById: uploader?.id ?? null,
        },
        { transaction },
      );
      ids.set(sha256, asset.id);
    }
    return ids;
  }

  /** After a failed upload: removes the files it wrote, except those of an asset (at any venue) that a simultaneous upload of the same image recorded. */
  private async removeUnclaimed(written: { sha256: string; key: string }[]): Promise<void> {
    if (written.length === 0) return;
    const claimed = new Set((await this.assets.findAll({ where: { sha256: written.map((file) => file.sha256) }, attributes: ['sha256'] })).map((row) => row.sha256));
    for (const { sha256, key } of written) if (!claimed.has(sha256)) await this.store.remove(key);
  }

  private async setAltTexts(mediaAssetId: number, alt: Record<string, string>, transaction: Transaction): Promise<void> {
    const entries = Object.entries(alt).map(([locale, text]) => ({ mediaAssetId, locale, text: text.trim() }));
    const cleared = entries.filter((entry) => entry.text === '').map((entry) => entry.locale);
    if (cleared.length > 0) await this.altTexts.destroy({ where: { mediaAssetId, locale: cleared }, transaction });
    const kept = entries.filter((entry) => entry.text !== '');
    if (kept.length > 0) await this.altTexts.bulkCreate(kept, { updateOnDuplicate: ['text', 'updatedAt'], transaction });
  }

  /** The image locked for a keeper of its venue's library. */
  private async lockAsset(id: number, member: Member, transaction: Transaction): Promise<MediaAsset> {
    const asset = withinReach(member, await this.assets.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }), NO_SUCH_IMAGE);
    actingAt(member, asset.venueId, MEDIA_KEEPERS);
    return asset;
  }

  /** Views of these assets in this order, each with renditions, alt texts and where it is used, and what the member may do at its venue. */
  private async viewsOf(ids: number[], member: Member): Promise<MediaView[]> {
    if (ids.length === 0) return [];
    const assets = await this.assets.findAll({ where: { id: ids }, include: [MediaRendition, MediaAltText] });
    const usage = await this.usageOf(ids);
    const venues = await this.venues.findAll({ where: { id: [...new Set(assets.map((asset) => asset.venueId))] }, attributes: ['id', 'sourceLocale', 'targetLocales'] });
    const byId = new Map(assets.map((asset) => [asset.id, asset]));
    return ids
      .map((id) => byId.get(id))
      .filter((asset): asset is MediaAsset => asset !== undefined)
      .map((asset) => {
        const uses = usage.filter((use) => use.mediaAssetId === asset.id);
        const venue = venues.find((each) => each.id === asset.venueId);
        const altLocales = canonicalLanguageTags([venue?.sourceLocale, ...(venue?.targetLocales ?? []), ...uses.map((use) => use.sourceLocale)]);
        return toMediaView(asset, uses.map(({ mediaAssetId: _, sourceLocale: __, ...use }) => use), altLocales, personAt(member, asset.venueId));
      });
  }

  private async usageOf(ids: number[], transaction?: Transaction): Promise<(MediaUsageView & { mediaAssetId: number; sourceLocale: string })[]> {
    const rows = await this.usages.findAll({
      where: { mediaAssetId: ids },
      include: [{ model: Panel, required: true, attributes: ['id', 'storyId', 'position'], include: [{ model: Story, attributes: ['id', 'title', 'sourceLocale'] }] }],
      transaction,
    });
    rows.sort((a, b) => a.panel!.story!.title.localeCompare(b.panel!.story!.title) || a.panel!.position - b.panel!.position);
    // People count panels from 1 in story order; positions may have gaps after a panel is deleted.
    const storyIds = [...new Set(rows.map((row) => row.panel!.storyId))];
    const panels = storyIds.length ? await this.panels.findAll({ where: { storyId: storyIds }, attributes: ['id', 'storyId', 'position'], order: [['position', 'ASC']], transaction }) : [];
    const panelNumber = (panel: Panel) => panels.filter((other) => other.storyId === panel.storyId).findIndex((other) => other.id === panel.id) + 1;
    return rows.map((row) => ({
      mediaAssetId: row.mediaAssetId, storyId: row.panel!.storyId, storyTitle: row.panel!.story!.title, sourceLocale: row.panel!.story!.sourceLocale, panelId: row.panelId, panelNumber: panelNumber(row.panel!),
    }));
  }
}

function inUse(usedIn: MediaUsageView[]): ConflictException {
  const stories = [...new Set(usedIn.map((use) => `"${use.storyTitle}"`))];
  return new ConflictException({
    statusCode: 409,
    message: `This image is used on ${usedIn.length} panel${usedIn.length === 1 ? '' : 's'} of ${stories.join(', ')}; take it off them first.`,
    errors: usedIn.map((use, index) => ({ path: ['usedIn', index], message: `"${use.storyTitle}", panel ${use.panelNumber}` })),
  });
}
