import { ConflictException, NotFoundException } from '@nestjs/common';
import { ForeignKeyConstraintError, Op, UniqueConstraintError } from 'sequelize';
import type { Model, ModelCtor } from 'sequelize-typescript';
import type { Page } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { likePattern, orderOf, SearchField, SortField } from '../common/list-query.js';
import { PageQuery, pageWindow, toPage } from '../common/page.js';

export const SETTINGS_SORT_KEYS = ['name', 'createdAt'] as const;

/** `?page&pageSize&q&sort` of every Settings list; q looks in the name. */
export class ListSettingsQuery extends PageQuery {
  @SearchField()
  q?: string;

  @SortField(SETTINGS_SORT_KEYS, 'name')
  sort: string = 'name';
}

export interface SettingsKind<M, V> {
  /** For messages: "There is no such gallery." */
  label: string;
  /** The record as the API shows it to `person`. */
  toView: (record: M, person: Person) => V;
  /** Why a delete is refused while other records point at this one. */
  inUse: string;
  /** The column a list query may narrow to one parent by (`?venueId=`). */
  parentKey?: string;
}

/**
 * What venues, galleries, stations and exhibits share: paged lists searched by the database,
 * reads, writes whose duplicates become 409 answers (a parent that does not exist is the API
 * filter's 422, naming the field), and deletes that the schema's RESTRICT keys refuse while
 * anything points at the record.
 */
export abstract class SettingsService<M extends Model & { id: number }, V> {
  protected constructor(
    protected readonly model: ModelCtor<M>,
    private readonly kind: SettingsKind<M, V>,
  ) {}

  async list(query: ListSettingsQuery, person: Person): Promise<Page<V>> {
    const parent = this.kind.parentKey ? (query as unknown as Record<string, unknown>)[this.kind.parentKey] : undefined;
    const where = {
      [Op.and]: [
        ...(parent !== undefined ? [{ [this.kind.parentKey!]: parent }] : []),
        ...(query.q ? [{ name: { [Op.like]: likePattern(query.q) } }] : []),
      ],
    };
    const { rows, count } = await this.model.findAndCountAll({ where, order: orderOf(query.sort), ...pageWindow(query) });
    return toPage(rows.map((record) => this.kind.toView(record, person)), count, query);
  }

  async find(id: number): Promise<M> {
    const record = await this.model.findByPk(id);
    if (!record) throw new NotFoundException(`There is no such ${this.kind.label}.`);
    return record;
  }

  async get(id: number, person: Person): Promise<V> {
    return this.kind.toView(await this.find(id), person);
  }

  create(values: object, person: Person): Promise<V> {
    return this.write(() => this.model.create({ ...values } as never), person);
  }

  async update(id: number, changes: object, person: Person): Promise<V> {
    const record = await this.find(id);
    return this.write(() => record.update(changes as never), person);
  }

  async delete(id: number): Promise<void> {
    const record = await this.find(id);
    try {
      await record.destroy();
    } catch (error) {
      if (error instanceof ForeignKeyConstraintError) throw new ConflictException(this.kind.inUse);
      throw error;
    }
  }

  private async write(work: () => Promise<M>, person: Person): Promise<V> {
    try {
      return this.kind.toView(await work(), person);
    } catch (error) {
      if (error instanceof UniqueConstraintError) {
        throw new ConflictException(`Another ${this.kind.label} already uses this ${Object.keys(error.fields).join(', ') || 'value'}.`);
      }
      throw error;
    }
  }
}
