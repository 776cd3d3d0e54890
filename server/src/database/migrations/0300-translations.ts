import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const owner = (table: string) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: true,
  references: { model: table, key: 'id' },
  onDelete: 'CASCADE',
});

export async function up(qi: QueryInterface): Promise<void> {
  // One row per translation unit and target locale. A panel's units belong to the panel (and its
  // story); an image's alt text unit belongs to the media asset, shared by every story showing it.
  await qi.createTable('translations', {
    id,
    unit_id: { type: DataTypes.STRING(191), allowNull: false },
    locale: { type: DataTypes.STRING(35), allowNull: false },
    story_id: owner('stories'),
    panel_id: owner('panels'),
    media_asset_id: owner('media_assets'),
    // The display form (`Le {1}roc{/1} monte`), placeholders and all.
    text: { type: DataTypes.TEXT, allowNull: false },
    source_hash: { type: DataTypes.CHAR(64), allowNull: false },
    // The source as it read when translated, shown beside the new one once the unit is stale.
    source_text: { type: DataTypes.TEXT, allowNull: false },
    // The version of the panel's source document it was made from (null for alt text): a cheap
    // "has the source moved since" for the stale digest, before any unit is cut.
    source_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    translator_id: userReference(true, 'SET NULL'),
    // The current source hash the stale digest last told translators about, so each change is told once.
    stale_notified_hash: { type: DataTypes.CHAR(64), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('translations', ['unit_id', 'locale'], { unique: true });
  await qi.addIndex('translations', ['story_id', 'locale']);
  await qi.addIndex('translations', ['media_asset_id', 'locale']);

  // Which translator locales have been announced by mail, so each assignment is mailed once.
  await qi.createTable('translator_assignments', {
    id,
    user_id: { ...userReference(false, 'CASCADE') },
    locale: { type: DataTypes.STRING(35), allowNull: false },
    notified_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('translator_assignments', ['user_id', 'locale'], { unique: true });

  // Off by default: a release then needs every locale complete rather than showing the source.
  await qi.addColumn('venues', 'fallback_to_source', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('venues', 'fallback_to_source');
  for (const table of ['translator_assignments', 'translations']) await qi.dropTable(table);
}
