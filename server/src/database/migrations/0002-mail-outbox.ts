import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps } from './table-options.js';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('outbox_messages', {
    id,
    recipient: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(255), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: false },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    // A worker claims a message until this moment, so two server instances never send it twice.
    locked_until: { type: DataTypes.DATE(3), allowNull: true },
    last_error: { type: DataTypes.STRING(1000), allowNull: true },
    sent_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('outbox_messages', ['sent_at', 'next_attempt_at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('outbox_messages');
}
