import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps, userReference } from './table-options.js';

const reference = (table: string, allowNull: boolean, onDelete: 'CASCADE' | 'SET NULL') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('venues', 'required_approvals', { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 1 });

  // Snapshot, hash and preflight never change once written; only the state moves on.
  await qi.createTable('revisions', {
    id,
    story_id: reference('stories', false, 'CASCADE'),
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
    state: { type: DataTypes.ENUM('open', 'approved', 'changes_requested', 'superseded'), allowNull: false },
    snapshot: { type: DataTypes.JSON, allowNull: false },
    preflight: { type: DataTypes.JSON, allowNull: false },
    // Counted at submit so the review queue sorts and shows them without reading the JSON.
    blocker_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    warning_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    submitted_by_id: userReference(true, 'SET NULL'),
    submitted_at: { type: DataTypes.DATE(3), allowNull: false },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('revisions', ['story_id', 'number'], { unique: true });
  await qi.addIndex('revisions', ['state', 'submitted_at']);

  await qi.createTable('reviews', {
    id,
    revision_id: reference('revisions', false, 'CASCADE'),
    reviewer_id: userReference(true, 'SET NULL'),
    verdict: { type: DataTypes.ENUM('approve', 'request_changes'), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('reviews', ['revision_id', 'verdict']);

  await qi.createTable('comments', {
    id,
    revision_id: reference('revisions', false, 'CASCADE'),
    // The snapshot's panel id, not a key: the panel may be deleted from the draft later.
    panel_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    range_from: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    range_to: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    range_quote: { type: DataTypes.STRING(1000), allowNull: true },
    body: { type: DataTypes.TEXT, allowNull: false },
    author_id: userReference(true, 'SET NULL'),
    parent_id: reference('comments', true, 'CASCADE'),
    resolved_at: { type: DataTypes.DATE(3), allowNull: true },
    resolved_by_id: userReference(true, 'SET NULL'),
    carried_from_revision_id: reference('revisions', true, 'SET NULL'),
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('comments', ['revision_id', 'created_at']);

  await qi.createTable('notifications', {
    id,
    recipient_id: userReference(false, 'CASCADE'),
    kind: { type: DataTypes.STRING(40), allowNull: false },
    title: { type: DataTypes.STRING(255), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    link: { type: DataTypes.STRING(500), allowNull: false },
    read_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  }, tableOptions);
  await qi.addIndex('notifications', ['recipient_id', 'created_at']);
  await qi.addIndex('notifications', ['recipient_id', 'read_at']);

  // A row only where a person changed the default (every kind is mailed).
  await qi.createTable('notification_preferences', {
    user_id: { ...userReference(false, 'CASCADE'), primaryKey: true },
    kind: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
    email: { type: DataTypes.BOOLEAN, allowNull: false },
  }, tableOptions);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['notification_preferences', 'notifications', 'comments', 'reviews', 'revisions']) await qi.dropTable(table);
  await qi.removeColumn('venues', 'required_approvals');
}
