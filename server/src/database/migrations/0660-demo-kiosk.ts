import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Issue 12, a first start that shows the whole job: the demo venue's kiosk and its invented
 * heartbeats and visitor events are marked, so the studio can say they are demo data and the fleet
 * watcher never mails anyone about a screen that does not exist.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('kiosks', 'demo', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('kiosks', 'demo');
}
