import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions } from './table-options.js';

export async function up(qi: QueryInterface): Promise<void> {
  // The panels a release carries, from its revisions' snapshots: what a kiosk's visitor events may
  // name (issue 11). The panel id is the snapshot's, not a key: the draft's panel may be deleted later.
  await qi.createTable('release_panels', {
    id,
    release_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'releases', key: 'id' }, onDelete: 'CASCADE' },
    story_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    panel_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  }, tableOptions);
  await qi.addIndex('release_panels', ['release_id', 'panel_id'], { unique: true });
  await qi.addIndex('release_panels', ['panel_id']);
  await qi.sequelize.query(`
    INSERT INTO release_panels (release_id, story_id, panel_id)
    SELECT DISTINCT rs.release_id, rs.story_id, panel.id
    FROM release_stories rs
    JOIN revisions r ON r.id = rs.revision_id,
    JSON_TABLE(r.snapshot, '$.panels[*]' COLUMNS (id INT UNSIGNED PATH '$.id')) AS panel
    WHERE panel.id IS NOT NULL`);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('release_panels');
}
