import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const publicationReport = {
  publication_sequence: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
  publication_expires_at: { type: DataTypes.DATE(3), allowNull: true },
  publication_expired: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
};

export async function up(qi: QueryInterface): Promise<void> {
  // Every publish and rollback of a gallery, numbered by `sequence` (issue 11). The unique key is
  // the last guard; publishing numbers them under a lock on the gallery's row.
  await qi.createTable('publications', {
    id,
    gallery_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'galleries', key: 'id' }, onDelete: 'RESTRICT' },
    sequence: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    release_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'releases', key: 'id' }, onDelete: 'RESTRICT' },
    kind: { type: DataTypes.ENUM('publish', 'rollback'), allowNull: false },
    published_at: { type: DataTypes.DATE(3), allowNull: false },
    published_by_id: userReference(true, 'SET NULL'),
    // The signed copy a kiosk receives; re-signed with a later expiry while the gallery is healthy.
    record: { type: DataTypes.TEXT, allowNull: true },
    signature: { type: DataTypes.STRING(120), allowNull: true },
    expires_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('publications', ['gallery_id', 'sequence'], { unique: true });

  // A release Live before publications existed is the gallery's first; it is signed on the first ask.
  await qi.sequelize.query(`
    INSERT INTO publications (gallery_id, sequence, release_id, kind, published_at, published_by_id, created_at, updated_at)
    SELECT live_gallery_id, 1, id, 'publish', COALESCE(published_at, updated_at), published_by_id, NOW(3), NOW(3)
    FROM releases WHERE live_gallery_id IS NOT NULL`);

  // What each kiosk says of the publication it follows.
  for (const table of ['kiosks', 'kiosk_heartbeats']) {
    for (const [column, definition] of Object.entries(publicationReport)) await qi.addColumn(table, column, definition);
  }
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['kiosk_heartbeats', 'kiosks']) {
    for (const column of Object.keys(publicationReport)) await qi.removeColumn(table, column);
  }
  await qi.dropTable('publications');
}
