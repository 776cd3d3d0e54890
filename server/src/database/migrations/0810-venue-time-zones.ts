import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Issue 13, venue time zones: each venue's days (Insights, licence expiry, preflight's "today",
 * dates in mail and exports) follow its own clock. An IANA name, canonical as Intl resolves it;
 * venues set up before keep UTC, the days they had.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('venues', 'time_zone', { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('venues', 'time_zone');
}
