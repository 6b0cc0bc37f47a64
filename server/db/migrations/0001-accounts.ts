import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ queryInterface, sequelize }: MigrationContext): Promise<void> {
  await queryInterface.createTable('studios', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    default_unit: { type: DataTypes.ENUM('in', 'cm'), allowNull: false, defaultValue: 'in' },
    default_paper: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'letter' },
    seam_allowance_mm: { type: DataTypes.DECIMAL(6, 2), allowNull: false, defaultValue: 6.35 },
    hem_allowance_mm: { type: DataTypes.DECIMAL(6, 2), allowNull: false, defaultValue: 12.7 },
    binding_ratio: { type: DataTypes.DECIMAL(4, 3), allowNull: false, defaultValue: 1 },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await queryInterface.createTable('users', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'studios', key: 'id' },
      onDelete: 'RESTRICT',
    },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'cutter'), allowNull: false },
    disabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await queryInterface.addIndex('users', ['studio_id']);
  await queryInterface.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex('sessions', ['user_id']);
  await queryInterface.addIndex('sessions', ['expires']);
  void sequelize;
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('sessions');
  await queryInterface.dropTable('users');
  await queryInterface.dropTable('studios');
}
