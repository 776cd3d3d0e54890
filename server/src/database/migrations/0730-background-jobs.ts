import { DataTypes, type QueryInterface } from 'sequelize';
import { tableOptions } from './table-options.js';

/**
 * Issue 15, several server instances: every queued item is claimed by one instance (`claimed_by`)
 * until `claim_expires_at`, so two never work on it at once and a dead one's claim runs out.
 * Periodic tasks that must run on one instance at a time hold a named lease in `job_leases`.
 */
const claimColumns = {
  claimed_by: { type: DataTypes.STRING(100), allowNull: true },
  claim_expires_at: { type: DataTypes.DATE(3), allowNull: true },
};

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('job_leases', {
    name: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
    ...claimColumns,
  }, tableOptions);

  await qi.renameColumn('outbox_messages', 'locked_until', 'claim_expires_at');
  await qi.addColumn('outbox_messages', 'claimed_by', claimColumns.claimed_by);

  await qi.renameColumn('releases', 'lease_until', 'claim_expires_at');
  await qi.addColumn('releases', 'claimed_by', claimColumns.claimed_by);

  for (const [name, column] of Object.entries(claimColumns)) await qi.addColumn('password_reset_requests', name, column);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const name of Object.keys(claimColumns)) await qi.removeColumn('password_reset_requests', name);
  await qi.removeColumn('releases', 'claimed_by');
  await qi.renameColumn('releases', 'claim_expires_at', 'lease_until');
  await qi.removeColumn('outbox_messages', 'claimed_by');
  await qi.renameColumn('outbox_messages', 'claim_expires_at', 'locked_until');
  await qi.dropTable('job_leases');
}
