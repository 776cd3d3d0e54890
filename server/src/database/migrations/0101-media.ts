import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const sha256 = { type: DataTypes.CHAR(64), allowNull: false };

const asset = (onDelete: 'CASCADE' | 'RESTRICT') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: 'media_assets', key: 'id' },
  onDelete,
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('media_assets', {
    id,
    sha256: { ...sha256, unique: true },
    original_filename: { type: DataTypes.STRING(255), allowNull: false },
    mime: { type: DataTypes.STRING(40), allowNull: false },
    width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    placeholder: { type: DataTypes.TEXT, allowNull: false },
    credit: { type: DataTypes.STRING(500), allowNull: true },
    licence_kind: { type: DataTypes.ENUM('spdx', 'all-rights-reserved'), allowNull: true },
    licence_spdx_id: { type: DataTypes.STRING(100), allowNull: true },
    licence_holder: { type: DataTypes.STRING(200), allowNull: true },
    licence_expires_on: { type: DataTypes.DATEONLY, allowNull: true },
    uploaded_by_id: userReference(true, 'SET NULL'),
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('media_assets', ['licence_expires_on']);

  await qi.createTable('media_renditions', {
    id,
    media_asset_id: asset('CASCADE'),
    width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sha256,
    store_key: { type: DataTypes.STRING(200), allowNull: false },
    bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('media_renditions', ['media_asset_id', 'width'], { unique: true });

  await qi.createTable('media_alt_texts', {
    id,
    media_asset_id: asset('CASCADE'),
    locale: { type: DataTypes.STRING(35), allowNull: false },
    text: { type: DataTypes.STRING(1000), allowNull: false },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('media_alt_texts', ['media_asset_id', 'locale'], { unique: true });

  // Rewritten from the document on every panel save. RESTRICT: the database itself refuses to
  // drop an asset a panel still shows.
  await qi.createTable('panel_media_usages', {
    panel_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    media_asset_id: { ...asset('RESTRICT'), primaryKey: true },
  }, tableOptions);
  await qi.addIndex('panel_media_usages', ['media_asset_id']);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['panel_media_usages', 'media_alt_texts', 'media_renditions', 'media_assets']) await qi.dropTable(table);
}
