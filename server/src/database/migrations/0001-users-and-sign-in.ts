import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const tokenHash = { type: DataTypes.CHAR(64), allowNull: false, unique: true };

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    roles: { type: DataTypes.JSON, allowNull: false },
    locales: { type: DataTypes.JSON, allowNull: false },
    ui_language: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'en' },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    last_sign_in_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('invitations', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    roles: { type: DataTypes.JSON, allowNull: false },
    locales: { type: DataTypes.JSON, allowNull: false },
    ui_language: { type: DataTypes.STRING(12), allowNull: false },
    token_hash: tokenHash,
    invited_by_id: userReference(true, 'SET NULL'),
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    accepted_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('invitations', ['email']);

  await qi.createTable('password_resets', {
    id,
    user_id: userReference(false, 'CASCADE'),
    token_hash: tokenHash,
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    used_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);

  await qi.createTable('refresh_tokens', {
    id,
    user_id: userReference(false, 'CASCADE'),
    family_id: { type: DataTypes.CHAR(36), allowNull: false },
    token_hash: tokenHash,
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    rotated_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('refresh_tokens', ['family_id']);

  // One row per failed sign-in, so every server instance counts the same failures.
  await qi.createTable('sign_in_failures', {
    id: { ...id, type: DataTypes.BIGINT.UNSIGNED },
    email: { type: DataTypes.STRING(254), allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('sign_in_failures', ['email', 'created_at']);
  await qi.addIndex('sign_in_failures', ['client_address', 'created_at']);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['sign_in_failures', 'refresh_tokens', 'password_resets', 'invitations', 'users']) {
    await qi.dropTable(table);
  }
}
