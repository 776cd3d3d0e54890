import { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations/index.js';
import { sequelizeOptions } from './sequelize-options.js';

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrate(databaseUrl: string): Promise<string[]> {
  const { uri, ...options } = sequelizeOptions(databaseUrl);
  const sequelize = new Sequelize(uri, options);
  try {
    const applied = await createMigrator(sequelize).up();
    return applied.map((m) => m.name);
  } finally {
    await sequelize.close();
  }
}
