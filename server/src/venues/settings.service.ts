import { ConflictException } from '@nestjs/common';
import { ForeignKeyConstraintError, Op, UniqueConstraintError, type Includeable } from 'sequelize';
import type { Model, ModelCtor } from 'sequelize-typescript';
import { SETTINGS_SORT, type Page, type Role, type SettingsSort } from '@mantlepiece/shared';
import { inScope, personAt, scopeWhere, venueScope, type Member, type Person } from '../auth/policy.js';
import { likePattern, orderOf, SearchField, SortField } from '../common/list-query.js';
import { PageQuery, pageWindow, toPage } from '../common/page.js';
import { unknownReference } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import type { Gallery } from './models/gallery.model.js';

/** `?page&pageSize&q&sort` of every Settings list; q looks in the name. */
export class ListSettingsQuery extends PageQuery {
  @SearchField()
  q?: string;

  @SortField(SETTINGS_SORT)
  sort: SettingsSort = SETTINGS_SORT.fallback;
}

/** Where a kind of record has its venue. */
export interface VenuePlace<M> {
  /** The attribute a `where` names the venue by: `id` of a venue, `venueId`, or `$gallery.venue_id$` through `include`. */
  column: string;
  include?: Includeable[];
  of: (record: M) => number;
  /** The venue of the parent a new record names by `parentKey`; null when there is no such parent. */
  ofParent?: (parentId: number) => Promise<number | null>;
}

export interface SettingsKind<M, V> {
  /** For messages: "There is no such gallery." */
  label: string;
  /** The record as the API shows it to `person` (who they are at the record's venue). */
  toView: (record: M, person: Person) => V;
  /** Why a delete is refused while other records point at this one. */
  inUse: string;
  /** The column a list query may narrow to one parent by (`?galleryId=`), and that a new record names its parent by. */
  parentKey?: string;
  venue: VenuePlace<M>;
  /** Who changes the records of a venue, holding the role there. */
  keepers: readonly Role[];
}

/** The answer for a parent the caller cannot see: the same as the error filter's for one that does not exist. */
const NO_SUCH_PARENT = 'There is no such record.';

/**
 * What venues, galleries, stations and exhibits share: paged lists searched by the database,
 * reads, writes whose duplicates become 409 answers (a parent that does not exist is the API
 * filter's 422, naming the field), and deletes that the schema's RESTRICT keys refuse while
 * anything points at the record. Each is scoped to the caller's venues: another venue's record
 * answers as one that does not exist, and only its keepers at the record's venue change it.
 */
export abstract class SettingsService<M extends Model & { id: number }, V> {
  protected constructor(
    protected readonly model: ModelCtor<M>,
    private readonly kind: SettingsKind<M, V>,
  ) {}

  /** `?venueId=` narrows any Settings list to one venue; without it the list holds all of the caller's. */
  async list(query: ListSettingsQuery & { venueId?: number }, member: Member): Promise<Page<V>> {
    const { parentKey, venue } = this.kind;
    const parent = parentKey ? (query as unknown as Record<string, unknown>)[parentKey] : undefined;
    const where = {
      [Op.and]: [
        scopeWhere(venueScope(member), venue.column),
        ...(query.venueId !== undefined ? [{ [venue.column]: query.venueId }] : []),
        ...(parent !== undefined ? [{ [parentKey!]: parent }] : []),
        ...(query.q ? [{ name: { [Op.like]: likePattern(query.q) } }] : []),
      ],
    };
    const { rows, count } = await this.model.findAndCountAll({ where, include: venue.include, order: orderOf(query.sort), ...pageWindow(query) });
    return toPage(rows.map((record) => this.view(record, member)), count, query);
  }

  /** The record, if the member holds any role at its venue. */
  async find(id: number, member: Member): Promise<M> {
    const record = await this.model.findByPk(id, { include: this.kind.venue.include });
    withinReach(member, record && { venueId: this.kind.venue.of(record) }, `There is no such ${this.kind.label}.`);
    return record!;
  }

  async get(id: number, member: Member): Promise<V> {
    return this.view(await this.find(id, member), member);
  }

  async create(values: object, member: Member): Promise<V> {
    await this.refuseUnlessKeeperOfParent(values, member);
    return this.write(async () => {
      const { id } = (await this.model.create({ ...values } as never)) as { id: number };
      return (await this.model.findByPk(id, { include: this.kind.venue.include }))!;
    }, member);
  }

  async update(id: number, changes: object, member: Member): Promise<V> {
    const record = await this.kept(id, member);
    return this.write(() => record.update(changes as never), member);
  }

  async delete(id: number, member: Member): Promise<void> {
    const record = await this.kept(id, member);
    try {
      await record.destroy();
    } catch (error) {
      if (error instanceof ForeignKeyConstraintError) throw new ConflictException(this.kind.inUse);
      throw error;
    }
  }

  /** The record, for a change its venue's keepers make. */
  protected async kept(id: number, member: Member): Promise<M> {
    const record = await this.find(id, member);
    actingAt(member, this.kind.venue.of(record), this.kind.keepers);
    return record;
  }

  /** A new record's parent must be one the member sees (else 422, as for one that does not exist) and keeps. */
  private async refuseUnlessKeeperOfParent(values: object, member: Member): Promise<void> {
    const { parentKey, venue } = this.kind;
    if (!parentKey || !venue.ofParent) return;
    const parentId = (values as Record<string, unknown>)[parentKey] as number;
    const venueId = await venue.ofParent(parentId);
    if (venueId === null || !inScope(venueScope(member), venueId)) throw unknownReference([parentKey], NO_SUCH_PARENT);
    actingAt(member, venueId, this.kind.keepers);
  }

  private view(record: M, member: Member): V {
    return this.kind.toView(record, personAt(member, this.kind.venue.of(record)));
  }

  private async write(work: () => Promise<M>, member: Member): Promise<V> {
    try {
      return this.view(await work(), member);
    } catch (error) {
      if (error instanceof UniqueConstraintError) {
        throw new ConflictException(`Another ${this.kind.label} already uses this ${Object.keys(error.fields).join(', ') || 'value'}.`);
      }
      throw error;
    }
  }
}

/** The place of a record that belongs to a gallery: its gallery's venue, read through a join. */
export function galleryVenue<M extends Model & { gallery?: Gallery }>(galleries: typeof Gallery): VenuePlace<M> {
  return {
    column: '$gallery.venue_id$',
    include: [{ model: galleries, attributes: ['id', 'venueId'], required: true }],
    of: (record) => record.gallery!.venueId,
    ofParent: async (galleryId) => (await galleries.findByPk(galleryId, { attributes: ['venueId'] }))?.venueId ?? null,
  };
}
