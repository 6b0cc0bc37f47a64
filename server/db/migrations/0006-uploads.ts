import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

/** The stored image: where its two files are and what they are. */
const imageColumns = {
  full_key: { type: DataTypes.STRING(200), allowNull: false },
  thumb_key: { type: DataTypes.STRING(200), allowNull: false },
  content_type: { type: DataTypes.STRING(40), allowNull: false },
  width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  thumb_width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  thumb_height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  uploaded_by_id: {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  },
  uploaded_by_name: { type: DataTypes.STRING(120), allowNull: false },
};

const studioRef = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: 'studios', key: 'id' },
  onDelete: 'RESTRICT',
};

/**
 * Fitting photos of clients and one swatch photo per fabric. Rows go with their client or
 * fabric (CASCADE); the app removes the stored files after such a delete commits.
 */
export async function up({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.createTable('photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: studioRef,
    client_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'clients', key: 'id' },
      onDelete: 'CASCADE',
    },
    kind: { type: DataTypes.ENUM('front', 'side', 'back', 'other'), allowNull: false },
    taken_on: { type: DataTypes.DATEONLY, allowNull: false },
    // The set's id (its first version's row), so the photo stays with the set through corrections.
    measurement_set_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'measurement_sets', key: 'id' },
      onDelete: 'SET NULL',
    },
    ...imageColumns,
    ...timestamps,
  });
  await queryInterface.addIndex('photos', ['studio_id', 'client_id', 'taken_on']);

  await queryInterface.createTable('swatches', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: studioRef,
    fabric_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      unique: true,
      references: { model: 'fabrics', key: 'id' },
      onDelete: 'CASCADE',
    },
    ...imageColumns,
    ...timestamps,
  });
  await queryInterface.addIndex('swatches', ['studio_id']);
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('swatches');
  await queryInterface.dropTable('photos');
}
