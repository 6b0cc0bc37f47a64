import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

/**
 * Failed sign-ins, kept in the database rather than in an app server's memory so that the
 * throttle holds across several app servers. `account_key` is a SHA-256 of the e-mail address:
 * the table never holds the addresses people typed.
 */
export async function up({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.createTable('sign_in_failures', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    account_key: { type: DataTypes.CHAR(64), allowNull: false },
    ip: { type: DataTypes.STRING(45), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('sign_in_failures', ['account_key', 'created_at']);
  await queryInterface.addIndex('sign_in_failures', ['ip', 'created_at']);
  await queryInterface.addIndex('sign_in_failures', ['created_at']);
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('sign_in_failures');
}
