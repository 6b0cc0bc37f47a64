import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

// E-mail: invitations, password resets, the record of every send (deliveries), the messages the
// local SMTP sink received (sent_messages and their attachments) and the mail rate limits.
// Tokens are kept only as SHA-256 hashes. The enum lists are written out (not imported) so this
// migration stays as it shipped.
const DELIVERY_KINDS = ['invitation', 'password_reset', 'measurements', 'tiles', 'sheet', 'ticket'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

function ref(table: string, allowNull = false, onDelete: 'RESTRICT' | 'CASCADE' | 'SET NULL' = 'RESTRICT') {
  return { type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model: table, key: 'id' }, onDelete };
}

export async function up({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.createTable('invitations', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'cutter'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by: ref('users', true, 'SET NULL'),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    sent_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    last_sent_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_user_id: ref('users', true, 'SET NULL'),
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex('invitations', ['studio_id', 'email']);

  await queryInterface.createTable('password_resets', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: ref('users', false, 'CASCADE'),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex('password_resets', ['user_id']);

  await queryInterface.createTable('deliveries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    kind: { type: DataTypes.ENUM(...DELIVERY_KINDS), allowNull: false },
    client_id: ref('clients', true),
    draft_id: ref('drafts', true),
    invitation_id: ref('invitations', true, 'SET NULL'),
    to_address: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(255), allowNull: false },
    message_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    status: { type: DataTypes.ENUM('sending', 'sent', 'failed'), allowNull: false, defaultValue: 'sending' },
    error: { type: DataTypes.STRING(500), allowNull: true },
    sent_by: ref('users', true, 'SET NULL'),
    ...timestamps,
  });
  await queryInterface.addIndex('deliveries', ['studio_id', 'created_at']);
  await queryInterface.addIndex('deliveries', ['client_id']);
  await queryInterface.addIndex('deliveries', ['draft_id']);

  await queryInterface.createTable('sent_messages', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    // The studio whose delivery this message is; null for mail the sink got from elsewhere.
    studio_id: ref('studios', true, 'SET NULL'),
    message_id: { type: DataTypes.STRING(255), allowNull: true },
    from_address: { type: DataTypes.STRING(254), allowNull: false },
    from_name: { type: DataTypes.STRING(255), allowNull: false },
    to_addresses: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.STRING(255), allowNull: false },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    received_at: { type: DataTypes.DATE(3), allowNull: false },
    html: { type: DataTypes.TEXT('medium'), allowNull: true },
    text: { type: DataTypes.TEXT('medium'), allowNull: true },
    size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  });
  await queryInterface.addIndex('sent_messages', ['studio_id', 'received_at']);
  await queryInterface.addIndex('sent_messages', ['message_id']);

  await queryInterface.createTable('sent_message_attachments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    sent_message_id: ref('sent_messages', false, 'CASCADE'),
    filename: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(127), allowNull: false },
    size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    content: { type: DataTypes.BLOB('long'), allowNull: false },
  });
  await queryInterface.addIndex('sent_message_attachments', ['sent_message_id']);

  // Rate-limit counts, in the database so that every app server sees the same ones.
  await queryInterface.createTable('mail_throttle', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    bucket: { type: DataTypes.STRING(32), allowNull: false },
    key_hash: { type: DataTypes.CHAR(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('mail_throttle', ['bucket', 'key_hash', 'created_at']);
  await queryInterface.addIndex('mail_throttle', ['created_at']);
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('mail_throttle');
  await queryInterface.dropTable('sent_message_attachments');
  await queryInterface.dropTable('sent_messages');
  await queryInterface.dropTable('deliveries');
  await queryInterface.dropTable('password_resets');
  await queryInterface.dropTable('invitations');
}
