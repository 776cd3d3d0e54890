import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Issue 17, undo for deleting a panel or an image: a deleted row keeps its place (a panel its
 * position, an image its files) with the moment it was deleted, restorable for the deletion grace,
 * then purged by the deleted-items job. The index serves that job's search for expired rows.
 */
const TABLES = ['panels', 'media_assets'] as const;

export async function up(qi: QueryInterface): Promise<void> {
  for (const table of TABLES) {
    await qi.addColumn(table, 'deleted_at', { type: DataTypes.DATE(3), allowNull: true });
    await qi.addIndex(table, ['deleted_at']);
  }
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of TABLES) await qi.removeColumn(table, 'deleted_at');
}
