import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps } from './table-options.js';

const venueReference = (allowNull: boolean) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: 'venues', key: 'id' },
  onDelete: allowNull ? 'SET NULL' : 'RESTRICT',
});

/**
 * Venues become boundaries. A person's roles at one venue are a membership row; the roles and
 * locales kept on the account itself hold at every venue (the organisation admin's, and everyone's
 * before this migration, so an upgrade changes nobody's access until an admin narrows it).
 * Stories and images belong to one venue each; audit events and invitations name theirs, or none
 * for the organisation as a whole.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const query = (sql: string) => qi.sequelize.query(sql);

  await qi.createTable('venue_memberships', {
    id,
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    venue_id: { ...venueReference(false), onDelete: 'CASCADE' },
    roles: { type: DataTypes.JSON, allowNull: false },
    locales: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  }, tableOptions);
  await qi.addIndex('venue_memberships', ['user_id', 'venue_id'], { unique: true });
  await qi.addIndex('venue_memberships', ['venue_id']);

  // A story's venue was worked out as "its exhibit's, or else the first venue"; now it is stored.
  await qi.addColumn('stories', 'venue_id', venueReference(true));
  await query(`UPDATE stories s JOIN exhibits e ON e.id = s.exhibit_id JOIN galleries g ON g.id = e.gallery_id SET s.venue_id = g.venue_id`);
  await query(`UPDATE stories SET venue_id = (SELECT MIN(id) FROM venues) WHERE venue_id IS NULL`);
  const [[orphans]] = (await qi.sequelize.query('SELECT COUNT(*) AS n FROM stories WHERE venue_id IS NULL')) as [{ n: number }[], unknown];
  if (Number(orphans.n) > 0) throw new Error('Stories exist but no venue does: create a venue before this migration.');
  await qi.changeColumn('stories', 'venue_id', venueReference(false));
  await qi.addIndex('stories', ['venue_id', 'updated_at']);

  // An image belongs to the venue of the first story that shows it, or else the first venue; the
  // same bytes may now be uploaded at two venues, each its own asset sharing one stored file.
  await qi.addColumn('media_assets', 'venue_id', venueReference(true));
  await query(`UPDATE media_assets m SET venue_id = (
      SELECT s.venue_id FROM panel_media_usages u JOIN panels p ON p.id = u.panel_id JOIN stories s ON s.id = p.story_id
      WHERE u.media_asset_id = m.id ORDER BY s.id LIMIT 1)`);
  await query(`UPDATE media_assets SET venue_id = (SELECT MIN(id) FROM venues) WHERE venue_id IS NULL`);
  const [[loose]] = (await qi.sequelize.query('SELECT COUNT(*) AS n FROM media_assets WHERE venue_id IS NULL')) as [{ n: number }[], unknown];
  if (Number(loose.n) > 0) throw new Error('Images exist but no venue does: create a venue before this migration.');
  await qi.changeColumn('media_assets', 'venue_id', venueReference(false));
  await qi.addIndex('media_assets', ['venue_id', 'sha256'], { unique: true, name: 'media_assets_venue_sha256' });
  await qi.removeIndex('media_assets', 'sha256');

  await qi.addColumn('audit_events', 'venue_id', venueReference(true));
  await qi.addIndex('audit_events', ['venue_id', 'created_at']);
  await qi.addColumn('invitations', 'venue_id', { ...venueReference(true), onDelete: 'CASCADE' });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('invitations', 'venue_id');
  await qi.removeColumn('audit_events', 'venue_id');
  await qi.addIndex('media_assets', ['sha256'], { unique: true, name: 'sha256' });
  await qi.removeIndex('media_assets', 'media_assets_venue_sha256');
  await qi.removeColumn('media_assets', 'venue_id');
  await qi.removeColumn('stories', 'venue_id');
  await qi.dropTable('venue_memberships');
}
