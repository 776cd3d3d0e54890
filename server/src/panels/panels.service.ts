import { ConflictException, HttpStatus, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  checkPanelDocument, DELETION_GRACE_MS, emptyPanelDoc, PANEL_IMAGE_NODE, visitPanelNodes,
  type PanelConflictBody, type PanelDocJSON, type PanelIssue, type PanelView,
} from '@mantlepiece/shared';
import { VersionConflictException } from '../common/version-conflict.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import type { Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { Story } from '../stories/models/story.model.js';
import { NO_SUCH_STORY, refuseUnlessEditable, STORY_WRITERS } from '../stories/story-policy.js';
import type { CreatePanelDto, SavePanelDocumentDto, UpdatePanelDto } from './dto/panel.dto.js';
import { PanelDocument } from './models/panel-document.model.js';
import { PanelMediaUsage } from './models/panel-media-usage.model.js';
import { Panel } from './models/panel.model.js';
import { toPanelView } from './panels.presenter.js';

/** Museum practice: a panel holds tens of words, not hundreds. The curator sets each panel's own. */
export const DEFAULT_WORD_BUDGET = 60;

const MEDIA_ID = /^[1-9]\d{0,9}$/;
const NO_SUCH_PANEL = 'There is no such panel.';
const NOT_RESTORABLE = `There is no deleted panel to restore: a deleted panel can be restored for ${DELETION_GRACE_MS / 60_000} minutes.`;

function unprocessable(message: string, errors: PanelIssue[]): UnprocessableEntityException {
  return new UnprocessableEntityException({ statusCode: HttpStatus.UNPROCESSABLE_ENTITY, message, errors });
}

@Injectable()
export class PanelsService {
  constructor(
    @InjectModel(Panel) private readonly panels: typeof Panel,
    @InjectModel(PanelDocument) private readonly documents: typeof PanelDocument,
    @InjectModel(PanelMediaUsage) private readonly usages: typeof PanelMediaUsage,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(MediaAsset) private readonly media: typeof MediaAsset,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** A story's panels in order, each with its source-locale document. */
  async listForStory(story: Story, transaction?: Transaction): Promise<PanelView[]> {
    const panels = await this.panels.findAll({
      where: { storyId: story.id },
      include: [{ model: PanelDocument, where: { locale: story.sourceLocale } }],
      order: [['position', 'ASC'], ['id', 'ASC']],
      transaction,
    });
    return panels.map((panel) => toPanelView(panel, panel.documents![0]!));
  }

  async addPanel(storyId: number, dto: CreatePanelDto, member: Member): Promise<PanelView> {
    return this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, member, NO_SUCH_STORY, transaction);
      const doc = await this.checkDocument(dto.doc ?? emptyPanelDoc(), story, transaction);
      const count = await this.panels.count({ where: { storyId }, transaction });
      const position = Math.min(dto.position ?? count, count);
      await this.panels.increment('position', { by: 1, where: { storyId, position: { [Op.gte]: position } }, transaction });
      const panel = await this.panels.create({ storyId, position, wordBudget: dto.wordBudget ?? DEFAULT_WORD_BUDGET }, { transaction });
      const source = await this.documents.create({ panelId: panel.id, locale: story.sourceLocale, doc, version: 1 }, { transaction });
      await this.recordMediaUsage(panel.id, doc, transaction);
      await this.touchStory(storyId, transaction);
      return toPanelView(panel, source);
    });
  }

  /**
   * Saves the source document by compare-and-set on its version: of two editors who started from
   * the same version, the second gets a 409 with what the first saved, never a silent overwrite.
   */
  async saveDocument(panelId: number, { doc: json, version }: SavePanelDocumentDto, member: Member): Promise<{ version: number }> {
    return this.sequelize.transaction(async (transaction) => {
      const { panel, story } = await this.findPanel(panelId, member, transaction);
      const doc = await this.checkDocument(json, story, transaction);
      const where = { panelId, locale: story.sourceLocale };
      const [saved] = await this.documents.update({ doc, version: version + 1 }, { where: { ...where, version }, transaction });
      if (saved === 0) {
        // A locking read: a plain one would answer from this transaction's snapshot, which may predate the winning save.
        const current = await this.documents.findOne({ where, transaction, lock: transaction.LOCK.UPDATE });
        throw new VersionConflictException<Omit<PanelConflictBody, 'statusCode' | 'message'>>('Someone else saved this panel after you started editing it.', {
          currentVersion: current!.version,
          doc: current!.doc,
        });
      }
      await this.recordMediaUsage(panel.id, doc, transaction);
      await this.touchStory(story.id, transaction);
      return { version: version + 1 };
    });
  }

  async updatePanel(panelId: number, dto: UpdatePanelDto, member: Member): Promise<PanelView> {
    return this.sequelize.transaction(async (transaction) => {
      const { panel, story } = await this.findPanel(panelId, member, transaction);
      await panel.update({ wordBudget: dto.wordBudget }, { transaction });
      const source = await this.documents.findOne({ where: { panelId, locale: story.sourceLocale }, transaction });
      return toPanelView(panel, source!);
    });
  }

  /** Puts every panel of the story in the order given, all in one transaction. */
  async reorder(storyId: number, panelIds: number[], member: Member): Promise<PanelView[]> {
    return this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, member, NO_SUCH_STORY, transaction);
      const current = new Set((await this.panels.findAll({ where: { storyId }, attributes: ['id'], transaction })).map((panel) => panel.id));
      if (panelIds.length !== current.size || !panelIds.every((id) => current.has(id))) {
        throw new ConflictException("The list does not match this story's panels; someone may have added or deleted one. Reload and try again.");
      }
      for (const [position, id] of panelIds.entries()) await this.panels.update({ position }, { where: { id }, transaction });
      await this.touchStory(storyId, transaction);
      return this.listForStory(story, transaction);
    });
  }

  /**
   * Takes the panel out of the story at once (lists, revisions, releases and translations leave it
   * out) but keeps its row, position and documents, so `restorePanel` can put it back within the
   * deletion grace; the deleted-items job purges it after.
   */
  async deletePanel(panelId: number, member: Member): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const { panel, story } = await this.findPanel(panelId, member, transaction);
      await this.panels.update({ deletedAt: this.clock.now() }, { where: { id: panel.id }, transaction });
      await this.panels.decrement('position', { by: 1, where: { storyId: story.id, deletedAt: null, position: { [Op.gt]: panel.position } }, transaction });
      await this.touchStory(story.id, transaction);
    });
  }

  /**
   * Puts a panel deleted within the grace back at the position it had (the panels from there on
   * move along), with its documents, so deletions undone latest first give the exact order back;
   * one deleted longer ago answers as missing. Its images must still be in the library, as for any save.
   */
  async restorePanel(panelId: number, member: Member): Promise<PanelView> {
    return this.sequelize.transaction(async (transaction) => {
      const found = await this.panels.findByPk(panelId, { attributes: ['storyId'], paranoid: false, transaction });
      if (!found) throw new NotFoundException(NOT_RESTORABLE);
      const story = await this.lockStory(found.storyId, member, NOT_RESTORABLE, transaction);
      const panel = await this.panels.findByPk(panelId, { paranoid: false, transaction });
      if (!panel) throw new NotFoundException(NOT_RESTORABLE);
      if (panel.deletedAt === null) throw new ConflictException('This panel is not deleted.');
      if (panel.deletedAt.getTime() <= this.clock.now().getTime() - DELETION_GRACE_MS) throw new NotFoundException(NOT_RESTORABLE);
      const source = (await this.documents.findOne({ where: { panelId, locale: story.sourceLocale }, transaction }))!;
      await this.checkDocument(source.doc, story, transaction);
      const position = Math.min(panel.position, await this.panels.count({ where: { storyId: story.id }, transaction }));
      await this.panels.increment('position', { by: 1, where: { storyId: story.id, deletedAt: null, position: { [Op.gte]: position } }, transaction });
      await this.panels.update({ deletedAt: null, position }, { where: { id: panelId }, paranoid: false, transaction });
      await this.touchStory(story.id, transaction);
      await panel.reload({ paranoid: false, transaction });
      return toPanelView(panel, source);
    });
  }

  /** Removes for good the panels deleted before `cutoff` (their documents and image uses go with them); returns how many. */
  async purgeDeleted(cutoff: Date): Promise<number> {
    const expired = await this.panels.findAll({ where: { deletedAt: { [Op.lt]: cutoff } }, attributes: ['id'], paranoid: false, limit: 100 });
    if (expired.length === 0) return 0;
    return this.panels.destroy({ where: { id: expired.map((panel) => panel.id), deletedAt: { [Op.lt]: cutoff } }, force: true });
  }

  /**
   * The shared check (schema from panelExtensions, links, widget params), then: every image is in
   * the library of the story's venue; another venue's image answers as an unknown one.
   */
  private async checkDocument(json: unknown, story: Story, transaction: Transaction): Promise<PanelDocJSON> {
    const check = checkPanelDocument(json);
    if (!check.ok) throw unprocessable('This panel cannot be saved as it is.', check.errors);
    const images: { path: PanelIssue['path']; mediaId: string }[] = [];
    visitPanelNodes(check.doc, (node, path) => {
      if (node.type === PANEL_IMAGE_NODE) images.push({ path: [...path, 'attrs', 'mediaId'], mediaId: String(node.attrs?.mediaId) });
    });
    const wanted = [...new Set(images.map((image) => image.mediaId).filter((id) => MEDIA_ID.test(id)))].map(Number);
    // A shared lock: an image cannot be deleted between this check and the commit that records its use.
    const known = new Set((await this.media.findAll({ where: { id: wanted, venueId: story.venueId }, attributes: ['id'], transaction, lock: transaction.LOCK.SHARE })).map((asset) => String(asset.id)));
    const missing = images.filter((image) => !known.has(image.mediaId));
    if (missing.length > 0) {
      throw unprocessable('This panel cannot be saved as it is.', missing.map(({ path, mediaId }) => ({ path, message: `There is no image ${mediaId} in the media library.` })));
    }
    return check.doc;
  }

  private async recordMediaUsage(panelId: number, doc: PanelDocJSON, transaction: Transaction): Promise<void> {
    await this.usages.destroy({ where: { panelId }, transaction });
    const ids = new Set<number>();
    visitPanelNodes(doc, (node) => {
      if (node.type === PANEL_IMAGE_NODE) ids.add(Number(node.attrs?.mediaId));
    });
    await this.usages.bulkCreate([...ids].map((mediaAssetId) => ({ panelId, mediaAssetId })), { transaction });
  }

  /**
   * Every change to a story's panels goes through its row lock, so positions never interleave and
   * no change slips in after a submission; only a story the member writes at its venue, in a state
   * the curator may write in, is changed. `missing` is what an unreachable one answers.
   */
  private async lockStory(storyId: number, member: Member, missing: string, transaction: Transaction): Promise<Story> {
    const story = withinReach(member, await this.stories.findByPk(storyId, { transaction, lock: transaction.LOCK.UPDATE }), missing);
    actingAt(member, story.venueId, STORY_WRITERS);
    refuseUnlessEditable(story);
    return story;
  }

  private async findPanel(panelId: number, member: Member, transaction: Transaction): Promise<{ panel: Panel; story: Story }> {
    const found = await this.panels.findByPk(panelId, { attributes: ['storyId'], transaction });
    if (!found) throw new NotFoundException(NO_SUCH_PANEL);
    const story = await this.lockStory(found.storyId, member, NO_SUCH_PANEL, transaction);
    const panel = await this.panels.findByPk(panelId, { transaction });
    if (!panel) throw new NotFoundException(NO_SUCH_PANEL);
    return { panel, story };
  }

  /** A story's "updated" is when anything in it last changed, panels included. */
  private async touchStory(storyId: number, transaction: Transaction): Promise<void> {
    await this.stories.update({ updatedAt: new Date() }, { where: { id: storyId }, transaction });
  }
}
