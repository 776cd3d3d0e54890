import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const reference = (table: string, onDelete: 'CASCADE' | 'RESTRICT') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('releases', {
    id,
    gallery_id: reference('galleries', 'RESTRICT'),
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    state: { type: DataTypes.ENUM('building', 'ready', 'live', 'superseded', 'failed'), allowNull: false },
    progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    phase: { type: DataTypes.STRING(120), allowNull: false },
    failure: { type: DataTypes.STRING(1000), allowNull: true },
    // While a worker builds, it holds the build until this moment and pushes it on at each step;
    // a lease that runs out means the worker died, and the build is failed.
    lease_until: { type: DataTypes.DATE(3), allowNull: true },
    manifest: { type: DataTypes.TEXT('long'), allowNull: true },
    signature: { type: DataTypes.STRING(120), allowNull: true },
    manifest_sha256: { type: DataTypes.CHAR(64), allowNull: true },
    file_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    // Equal to gallery_id while the release is Live, else NULL: the unique key allows one Live release per gallery.
    live_gallery_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, unique: true },
    created_by_id: userReference(true, 'SET NULL'),
    ready_at: { type: DataTypes.DATE(3), allowNull: true },
    published_at: { type: DataTypes.DATE(3), allowNull: true },
    published_by_id: userReference(true, 'SET NULL'),
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('releases', ['gallery_id', 'number'], { unique: true });
  await qi.addIndex('releases', ['state']);

  // Which revision of which story a release carries, fixed when the release is asked for.
  await qi.createTable('release_stories', {
    id,
    release_id: reference('releases', 'CASCADE'),
    story_id: reference('stories', 'RESTRICT'),
    revision_id: reference('revisions', 'RESTRICT'),
    position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  }, tableOptions);
  await qi.addIndex('release_stories', ['release_id', 'story_id'], { unique: true });

  // The files a release lists; a stored file is kept while any release row names its hash.
  await qi.createTable('release_files', {
    id,
    release_id: reference('releases', 'CASCADE'),
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    mime: { type: DataTypes.STRING(80), allowNull: false },
  }, tableOptions);
  await qi.addIndex('release_files', ['release_id', 'sha256'], { unique: true });
  await qi.addIndex('release_files', ['sha256']);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['release_files', 'release_stories', 'releases']) await qi.dropTable(table);
}
