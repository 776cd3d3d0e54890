import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const reference = (table: string, allowNull: boolean, onDelete: 'CASCADE' | 'RESTRICT' | 'SET NULL') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('kiosks', {
    id,
    // RESTRICT: a station with a kiosk paired to it cannot be deleted (the API answers 409).
    station_id: reference('stations', false, 'RESTRICT'),
    device_token_hash: { type: DataTypes.CHAR(64), allowNull: true, unique: true },
    paired_at: { type: DataTypes.DATE(3), allowNull: false },
    paired_by_id: userReference(true, 'SET NULL'),
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    last_heartbeat_at: { type: DataTypes.DATE(3), allowNull: true },
    last_release_id: reference('releases', true, 'SET NULL'),
    app_version: { type: DataTypes.STRING(40), allowNull: true },
    uptime_s: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    storage_used_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    last_error: { type: DataTypes.STRING(1000), allowNull: true },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('pairing_requests', {
    id,
    // Not unique: the code space is small, so an expired request may have shown the same code.
    code_hash: { type: DataTypes.CHAR(64), allowNull: false },
    poll_token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    kiosk_id: reference('kiosks', true, 'CASCADE'),
    // When the kiosk collected its device token: a poll token hands one out once.
    collected_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('pairing_requests', ['code_hash', 'expires_at']);

  await qi.createTable('pairing_failures', {
    id,
    station_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('pairing_failures', ['station_id', 'created_at']);
  await qi.addIndex('pairing_failures', ['client_address', 'created_at']);

  await qi.createTable('kiosk_heartbeats', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
    kiosk_id: reference('kiosks', false, 'CASCADE'),
    received_at: { type: DataTypes.DATE(3), allowNull: false },
    release_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    app_version: { type: DataTypes.STRING(40), allowNull: false },
    uptime_s: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    storage_used_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    last_error: { type: DataTypes.STRING(1000), allowNull: true },
  }, tableOptions);
  await qi.addIndex('kiosk_heartbeats', ['kiosk_id', 'received_at']);

  // Anonymous visitor events. The kiosk's random id is the key, so an upload retried is stored once.
  await qi.createTable('kiosk_events', {
    id: { type: DataTypes.CHAR(36), primaryKey: true, allowNull: false },
    kiosk_id: reference('kiosks', false, 'CASCADE'),
    gallery_id: reference('galleries', false, 'CASCADE'),
    type: { type: DataTypes.STRING(40), allowNull: false },
    at: { type: DataTypes.DATE(3), allowNull: false },
    story_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    panel_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    widget_type: { type: DataTypes.STRING(60), allowNull: true },
    param: { type: DataTypes.STRING(60), allowNull: true },
    locale: { type: DataTypes.STRING(35), allowNull: true },
    dwell_ms: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    switch: { type: DataTypes.STRING(40), allowNull: true },
    received_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('kiosk_events', ['gallery_id', 'at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['kiosk_events', 'kiosk_heartbeats', 'pairing_failures', 'pairing_requests', 'kiosks']) await qi.dropTable(table);
}
