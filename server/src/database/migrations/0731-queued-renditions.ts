import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Issue 15, renditions as queued jobs: an upload keeps the original and answers at once; a worker
 * claims the asset (see 0730) and makes its WebP renditions, and the library shows how far it got
 * or why it failed. Images uploaded before have their renditions already.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('media_assets', 'rendition_state', { type: DataTypes.ENUM('pending', 'ready', 'failed'), allowNull: false, defaultValue: 'ready' });
  await qi.changeColumn('media_assets', 'rendition_state', { type: DataTypes.ENUM('pending', 'ready', 'failed'), allowNull: false, defaultValue: 'pending' });
  await qi.addColumn('media_assets', 'rendition_progress', { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 });
  await qi.sequelize.query("UPDATE media_assets SET rendition_progress = 1 WHERE rendition_state = 'ready'");
  await qi.addColumn('media_assets', 'rendition_failure', { type: DataTypes.STRING(1000), allowNull: true });
  await qi.addColumn('media_assets', 'claimed_by', { type: DataTypes.STRING(100), allowNull: true });
  await qi.addColumn('media_assets', 'claim_expires_at', { type: DataTypes.DATE(3), allowNull: true });
  await qi.addIndex('media_assets', ['rendition_state', 'claim_expires_at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeIndex('media_assets', ['rendition_state', 'claim_expires_at']);
  for (const column of ['claim_expires_at', 'claimed_by', 'rendition_failure', 'rendition_progress', 'rendition_state']) {
    await qi.removeColumn('media_assets', column);
  }
}
