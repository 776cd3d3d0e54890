import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps } from './table-options.js';

/**
 * One counter row per limit and subject (an account, a client address, a station) replaces the
 * one-row-per-failure tables: a row locked in a transaction counts exactly under parallel
 * requests and across server instances. Password reset requests are queued, so the answer to a
 * request does the same work whether or not the address has an account.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('rate_limits', {
    id: { ...id, type: DataTypes.BIGINT.UNSIGNED },
    scope: { type: DataTypes.STRING(40), allowNull: false },
    // Binary collation: two subjects are one only when they are the same bytes.
    subject: { type: DataTypes.STRING(330).BINARY, allowNull: false },
    count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    window_started_at: { type: DataTypes.DATE(3), allowNull: false },
    not_before: { type: DataTypes.DATE(3), allowNull: true },
  }, tableOptions);
  await qi.addIndex('rate_limits', ['scope', 'subject'], { unique: true, name: 'rate_limits_scope_subject' });
  await qi.addIndex('rate_limits', ['window_started_at']);
  await qi.dropTable('sign_in_failures');
  await qi.dropTable('pairing_failures');

  await qi.createTable('password_reset_requests', {
    id: { ...id, type: DataTypes.BIGINT.UNSIGNED },
    email: { type: DataTypes.STRING(254), allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: false },
    processed_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('password_reset_requests', ['processed_at', 'id']);
  await qi.addColumn('password_resets', 'voided_at', { type: DataTypes.DATE(3), allowNull: true });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('password_resets', 'voided_at');
  await qi.dropTable('password_reset_requests');
  await qi.dropTable('rate_limits');
  await qi.createTable('sign_in_failures', {
    id: { ...id, type: DataTypes.BIGINT.UNSIGNED },
    email: { type: DataTypes.STRING(254), allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('sign_in_failures', ['email', 'created_at']);
  await qi.addIndex('sign_in_failures', ['client_address', 'created_at']);
  await qi.createTable('pairing_failures', {
    id,
    station_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('pairing_failures', ['station_id', 'created_at']);
  await qi.addIndex('pairing_failures', ['client_address', 'created_at']);
}
