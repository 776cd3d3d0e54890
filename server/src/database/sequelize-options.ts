import type { SequelizeOptions } from 'sequelize-typescript';

/** How every connection of ours talks to MariaDB: utf8mb4 both ways, UTC, snake_case columns. */
export function sequelizeOptions(databaseUrl: string): SequelizeOptions & { uri: string } {
  return {
    uri: databaseUrl,
    dialect: 'mysql',
    logging: false,
    timezone: '+00:00',
    dialectOptions: { charset: 'utf8mb4', dateStrings: false },
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
    pool: { max: 10, idle: 10_000 },
  };
}
