import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Issue 12, the living story: a curator may withdraw a submission before its verdict, a
 * submission carries a note to the educators, and a comment carried to a newer revision records
 * whether the words it was anchored to are still there.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.changeColumn('revisions', 'state', { type: DataTypes.ENUM('open', 'approved', 'changes_requested', 'superseded', 'withdrawn'), allowNull: false });
  await qi.addColumn('revisions', 'note', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('comments', 'anchor_changed', { type: DataTypes.BOOLEAN, allowNull: true });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('comments', 'anchor_changed');
  await qi.removeColumn('revisions', 'note');
  // A withdrawn revision was never decided on; the older states call that superseded.
  await qi.sequelize.query("UPDATE `revisions` SET `state` = 'superseded' WHERE `state` = 'withdrawn'");
  await qi.changeColumn('revisions', 'state', { type: DataTypes.ENUM('open', 'approved', 'changes_requested', 'superseded'), allowNull: false });
}
