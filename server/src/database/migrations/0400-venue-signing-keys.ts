import { DataTypes, type QueryInterface } from 'sequelize';
import { id, tableOptions, timestamps } from './table-options.js';

/**
 * One Ed25519 key pair per venue. Keys are made by the server (it holds the secret that encrypts
 * the private half), for venues that exist on its first start and for each new venue.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('venue_signing_keys', {
    id,
    venue_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      unique: true,
      references: { model: 'venues', key: 'id' },
      onDelete: 'CASCADE',
    },
    /** Base64 SPKI DER: what WebCrypto's importKey('spki') takes. */
    public_key: { type: DataTypes.STRING(120), allowNull: false },
    /** PKCS#8 DER under AES-256-GCM, as `v1.<iv>.<tag>.<ciphertext>` in base64url. */
    private_key_sealed: { type: DataTypes.STRING(400), allowNull: false },
    ...timestamps,
  }, tableOptions);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('venue_signing_keys');
}
