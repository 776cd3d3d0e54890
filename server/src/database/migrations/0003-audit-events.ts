import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, userReference } from './table-options.js';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('audit_events', {
    id: { ...id, type: DataTypes.BIGINT.UNSIGNED },
    actor_id: userReference(true, 'SET NULL'),
    action: { type: DataTypes.STRING(64), allowNull: false },
    target_type: { type: DataTypes.STRING(32), allowNull: true },
    target_id: { type: DataTypes.STRING(64), allowNull: true },
    detail: { type: DataTypes.JSON, allowNull: true },
    client_address: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('audit_events', ['created_at']);
  await qi.addIndex('audit_events', ['action', 'created_at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('audit_events');
}
