import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

const studioRef = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: 'studios', key: 'id' },
  onDelete: 'RESTRICT',
};

const memberRef = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: true,
  references: { model: 'users', key: 'id' },
  onDelete: 'SET NULL',
};

/** Measurement columns, mm (to 1/100 mm), null when not taken. Frozen here: later fields need a new migration. */
const MEASUREMENT_COLUMNS = [
  'bust',
  'high_bust',
  'underbust',
  'waist',
  'hip',
  'neck_base',
  'shoulder_length',
  'across_back',
  'across_front',
  'nape_to_waist',
  'shoulder_to_bust',
  'armhole_depth',
  'shoulder_to_hip',
  'upper_arm',
  'arm_length',
  'wrist',
];

export async function up({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.createTable('clients', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: studioRef,
    name: { type: DataTypes.STRING(120), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: true },
    phone: { type: DataTypes.STRING(40), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await queryInterface.addIndex('clients', ['studio_id', 'archived', 'name']);
  await queryInterface.addIndex('clients', ['studio_id', 'email']);

  // One row per version of a set; a version is never changed once its transaction commits.
  // `set_id` is the id of the set's first version (filled in by the same transaction that
  // inserts it); (set_id, version) is unique so two corrections of one version cannot both land.
  const measurementColumns = Object.fromEntries(
    MEASUREMENT_COLUMNS.map((name) => [`${name}_mm`, { type: DataTypes.DOUBLE, allowNull: true }]),
  );
  await queryInterface.createTable('measurement_sets', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: studioRef,
    client_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'clients', key: 'id' },
      onDelete: 'RESTRICT',
    },
    set_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    taken_at: { type: DataTypes.DATEONLY, allowNull: false },
    taken_by_id: memberRef,
    taken_by_name: { type: DataTypes.STRING(120), allowNull: false },
    recorded_by_id: memberRef,
    recorded_by_name: { type: DataTypes.STRING(120), allowNull: false },
    ...measurementColumns,
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex('measurement_sets', ['set_id', 'version'], { unique: true, name: 'measurement_sets_set_version' });
  await queryInterface.addIndex('measurement_sets', ['studio_id', 'client_id', 'taken_at']);

  await queryInterface.createTable('fabrics', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: studioRef,
    name: { type: DataTypes.STRING(120), allowNull: false },
    fibre_content: { type: DataTypes.STRING(200), allowNull: true },
    width_mm: { type: DataTypes.DOUBLE, allowNull: true },
    weight_gsm: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    stretch_crosswise: { type: DataTypes.DECIMAL(4, 1), allowNull: false },
    stretch_lengthwise: { type: DataTypes.DECIMAL(4, 1), allowNull: true },
    recovery: { type: DataTypes.ENUM('good', 'fair', 'poor'), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await queryInterface.addIndex('fabrics', ['studio_id', 'name']);
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('measurement_sets');
  await queryInterface.dropTable('fabrics');
  await queryInterface.dropTable('clients');
}
