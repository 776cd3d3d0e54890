import { QueryTypes, type QueryInterface, type Transaction } from 'sequelize';
import { canonicalLanguageTag } from '@mantlepiece/shared';

/** A tag in canonical form, or as it was when it is not a well-formed tag (kept rather than lost). */
const canonical = (tag: string): string => canonicalLanguageTag(tag) ?? tag;

/** A single tag per row, with nothing unique about it. */
const PLAIN_COLUMNS: [table: string, column: string][] = [
  ['venues', 'source_locale'],
  ['stories', 'source_locale'],
  ['users', 'ui_language'],
  ['invitations', 'ui_language'],
  ['kiosk_events', 'locale'],
];

/** A tag that is unique together with `keys`; `newest` orders rows that become one. */
const UNIQUE_COLUMNS: { table: string; keys: string[]; newest: string }[] = [
  { table: 'panel_documents', keys: ['panel_id'], newest: 'updated_at' },
  { table: 'translations', keys: ['unit_id'], newest: 'updated_at' },
  { table: 'media_alt_texts', keys: ['media_asset_id'], newest: 'updated_at' },
  { table: 'translator_assignments', keys: ['user_id'], newest: 'notified_at' },
];

/** JSON arrays of tags. */
const LIST_COLUMNS: [table: string, column: string][] = [
  ['venues', 'target_locales'],
  ['users', 'locales'],
  ['invitations', 'locales'],
  ['venue_memberships', 'locales'],
];

/**
 * Language tags as the API now stores them: canonical BCP 47 (`Intl.getCanonicalLocales`, so
 * pt-br is pt-BR and iw is he), for rows written before it did. Case alone never splits a unique
 * key (the collation ignores case), but an old alias and its preferred tag can (iw and he for one
 * panel): the newer row is kept and the other removed, and each removal is written to the log.
 * Revision snapshots and release manifests stay as they were: they are hashed and signed. Running
 * it again changes nothing.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const existing = new Set((await qi.showAllTables()).map(String));
  await qi.sequelize.transaction(async (transaction) => {
    for (const [table, column] of PLAIN_COLUMNS) if (existing.has(table)) await canonicalisePlain(qi, table, column, transaction);
    for (const spec of UNIQUE_COLUMNS) if (existing.has(spec.table)) await canonicaliseUnique(qi, spec, transaction);
    for (const [table, column] of LIST_COLUMNS) if (existing.has(table)) await canonicaliseLists(qi, table, column, transaction);
  });
}

/** Canonical tags are valid input to every version of the API; there is nothing to undo. */
export async function down(): Promise<void> {}

/** The tags stored in a column, told apart by case (the column's own collation would merge pt-br and pt-BR). */
async function distinctTags(qi: QueryInterface, table: string, column: string, transaction: Transaction): Promise<string[]> {
  const rows = await qi.sequelize.query<{ tag: string }>(
    `SELECT DISTINCT \`${column}\` COLLATE utf8mb4_bin AS tag FROM \`${table}\` WHERE \`${column}\` IS NOT NULL`,
    { type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => row.tag);
}

async function canonicalisePlain(qi: QueryInterface, table: string, column: string, transaction: Transaction): Promise<void> {
  for (const tag of await distinctTags(qi, table, column, transaction)) {
    if (canonical(tag) === tag) continue;
    await qi.sequelize.query(`UPDATE \`${table}\` SET \`${column}\` = :to WHERE \`${column}\` COLLATE utf8mb4_bin = :from`, {
      replacements: { to: canonical(tag), from: tag }, transaction,
    });
  }
}

async function canonicaliseUnique(qi: QueryInterface, { table, keys, newest }: (typeof UNIQUE_COLUMNS)[number], transaction: Transaction): Promise<void> {
  const stale = (await distinctTags(qi, table, 'locale', transaction)).filter((tag) => canonical(tag) !== tag);
  if (stale.length === 0) return;
  // Every row that may share a canonical tag with a stale one: the stale tags and their canonical forms, in any case.
  const rows = await qi.sequelize.query<Record<string, string | number | Date>>(
    `SELECT id, ${keys.map((key) => `\`${key}\``).join(', ')}, locale COLLATE utf8mb4_bin AS locale, \`${newest}\` AS newest FROM \`${table}\` WHERE locale IN (:tags)`,
    { replacements: { tags: [...stale, ...stale.map(canonical)] }, type: QueryTypes.SELECT, transaction },
  );
  const groups = new Map<string, typeof rows>();
  for (const row of rows) {
    const key = JSON.stringify([...keys.map((k) => row[k]), canonical(String(row.locale))]);
    groups.set(key, [...(groups.get(key) ?? []), row]);
  }
  for (const group of groups.values()) {
    group.sort((a, b) => new Date(b.newest).getTime() - new Date(a.newest).getTime() || Number(b.id) - Number(a.id));
    const [kept, ...dropped] = group;
    const to = canonical(String(kept!.locale));
    for (const row of dropped) {
      console.warn(`Migration 0820: ${table} row ${String(row.id)} (${String(row.locale)}) is the same language as row ${String(kept!.id)} (${String(kept!.locale)}) once canonical (${to}); the newer, row ${String(kept!.id)}, is kept.`);
    }
    if (dropped.length > 0) await qi.sequelize.query(`DELETE FROM \`${table}\` WHERE id IN (:ids)`, { replacements: { ids: dropped.map((row) => row.id) }, transaction });
    if (kept!.locale !== to) await qi.sequelize.query(`UPDATE \`${table}\` SET locale = :to WHERE id = :id`, { replacements: { to, id: kept!.id }, transaction });
  }
}

async function canonicaliseLists(qi: QueryInterface, table: string, column: string, transaction: Transaction): Promise<void> {
  const columns = await qi.describeTable(table);
  if (!(column in columns)) return;
  const rows = await qi.sequelize.query<{ id: number; tags: string | string[] | null }>(`SELECT id, \`${column}\` AS tags FROM \`${table}\``, { type: QueryTypes.SELECT, transaction });
  for (const row of rows) {
    const tags: unknown = typeof row.tags === 'string' ? JSON.parse(row.tags) : row.tags;
    if (!Array.isArray(tags)) continue;
    const next = [...new Set(tags.map((tag: unknown) => (typeof tag === 'string' ? canonical(tag) : tag)))];
    if (JSON.stringify(next) === JSON.stringify(tags)) continue;
    await qi.sequelize.query(`UPDATE \`${table}\` SET \`${column}\` = :tags WHERE id = :id`, { replacements: { tags: JSON.stringify(next), id: row.id }, transaction });
  }
}
