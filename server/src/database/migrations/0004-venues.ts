import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps } from './table-options.js';

const parent = (table: string) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete: 'RESTRICT',
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('venues', {
    id,
    name: { type: DataTypes.STRING(160), allowNull: false },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    source_locale: { type: DataTypes.STRING(35), allowNull: false },
    target_locales: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('galleries', {
    id,
    venue_id: parent('venues'),
    name: { type: DataTypes.STRING(160), allowNull: false },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('stations', {
    id,
    gallery_id: parent('galleries'),
    name: { type: DataTypes.STRING(160), allowNull: false },
    screen_width_px: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    screen_height_px: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    orientation: { type: DataTypes.ENUM('landscape', 'portrait'), allowNull: false },
    mounting_height_mm: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    ...timestamps,
  }, tableOptions);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['stations', 'galleries', 'venues']) await qi.dropTable(table);
}
