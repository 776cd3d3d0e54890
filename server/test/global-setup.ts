import { Sequelize } from 'sequelize';
import { migrate } from '../src/database/migrator.js';
import { sequelizeOptions } from '../src/database/sequelize-options.js';
import { apiDatabaseUrl } from './api-database.js';

/** Drops the suites' database and builds it again from the migrations, so every run starts clean. */
export default async function setup(): Promise<void> {
  const url = apiDatabaseUrl();
  const name = decodeURIComponent(new URL(url).pathname.slice(1));
  const { uri, ...options } = sequelizeOptions(url);
  const sequelize = new Sequelize(uri, options);
  try {
    await sequelize.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await sequelize.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await sequelize.close();
  }
  await migrate(url);
}
