import { DataTypes, type QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  // Set when technicians were told a kiosk went silent, cleared when told it is back: one mail each way.
  await qi.addColumn('kiosks', 'silence_alerted_at', { type: DataTypes.DATE(3), allowNull: true });
  await qi.addIndex('kiosks', ['revoked_at', 'last_heartbeat_at']);
  await qi.addIndex('kiosk_heartbeats', ['kiosk_id', 'id']);
  // Insights count one event type in one gallery over a date range.
  await qi.addIndex('kiosk_events', ['gallery_id', 'type', 'at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeIndex('kiosk_events', ['gallery_id', 'type', 'at']);
  await qi.removeIndex('kiosk_heartbeats', ['kiosk_id', 'id']);
  await qi.removeIndex('kiosks', ['revoked_at', 'last_heartbeat_at']);
  await qi.removeColumn('kiosks', 'silence_alerted_at');
}
