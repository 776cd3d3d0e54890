import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const reference = (table: string, allowNull: boolean, onDelete: 'CASCADE' | 'RESTRICT') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('exhibits', {
    id,
    // RESTRICT: a gallery with exhibits in it cannot be deleted (the API answers 409).
    gallery_id: reference('galleries', false, 'RESTRICT'),
    name: { type: DataTypes.STRING(160), allowNull: false },
    planned_start: { type: DataTypes.DATEONLY, allowNull: true },
    planned_end: { type: DataTypes.DATEONLY, allowNull: true },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('stories', {
    id,
    title: { type: DataTypes.STRING(200), allowNull: false },
    audience: { type: DataTypes.ENUM('family', 'school', 'adult'), allowNull: false },
    source_locale: { type: DataTypes.STRING(35), allowNull: false },
    state: { type: DataTypes.ENUM('draft', 'in_review', 'changes_requested', 'approved', 'retired'), allowNull: false, defaultValue: 'draft' },
    exhibit_id: reference('exhibits', true, 'RESTRICT'),
    created_by_id: userReference(true, 'SET NULL'),
    // Set by the first release build that carries the story; from then on it can no longer be deleted.
    released_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('stories', ['state']);
  await qi.addIndex('stories', ['updated_at']);

  await qi.createTable('panels', {
    id,
    story_id: reference('stories', false, 'CASCADE'),
    position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    word_budget: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('panels', ['story_id', 'position']);

  // One Tiptap document per panel and locale, each with its own compare-and-set version.
  await qi.createTable('panel_documents', {
    id,
    panel_id: reference('panels', false, 'CASCADE'),
    locale: { type: DataTypes.STRING(35), allowNull: false },
    doc: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('panel_documents', ['panel_id', 'locale'], { unique: true });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['panel_documents', 'panels', 'stories', 'exhibits']) await qi.dropTable(table);
}
