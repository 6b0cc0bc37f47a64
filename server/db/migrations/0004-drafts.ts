import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrate.js';

// Blocks, their fit corrections, styles, drafts and draft revisions. Lengths in mm.
// The enum lists are written out (not imported) so this migration stays as it shipped.
const CORRECTION_TARGET_NAMES = [
  'bust', 'waist', 'hip', 'armholeDepth', 'length', 'bustEase', 'hipEase',
  'frontNeckDepth', 'backNeckDepth', 'strapInset', 'strapWidth', 'shoulderSlope',
];
const GARMENTS = ['tank'];
const DRAFT_STATES = ['drafting', 'approved', 'cut', 'sewn', 'delivered'];
const REVISION_KINDS = ['created', 'saved', 'restored', 'reopened'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

function ref(table: string, allowNull = false, onDelete: 'RESTRICT' | 'CASCADE' | 'SET NULL' = 'RESTRICT') {
  return { type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model: table, key: 'id' }, onDelete };
}

const userRef = () => ref('users', true, 'SET NULL');
const version = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };

export async function up({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.createTable('blocks', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    client_id: ref('clients'),
    measurement_set_id: ref('measurement_sets'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    created_by: userRef(),
    version,
    ...timestamps,
  });
  await queryInterface.addIndex('blocks', ['studio_id', 'client_id']);

  await queryInterface.createTable('block_corrections', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    block_id: ref('blocks', false, 'CASCADE'),
    target: { type: DataTypes.ENUM(...CORRECTION_TARGET_NAMES), allowNull: false },
    amount: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false },
    noted_on: { type: DataTypes.DATEONLY, allowNull: false },
    created_by: userRef(),
    ...timestamps,
  });
  await queryInterface.addIndex('block_corrections', ['block_id']);

  await queryInterface.createTable('styles', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    garment: { type: DataTypes.ENUM(...GARMENTS), allowNull: false },
    racer_back: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    defaults: { type: DataTypes.TEXT('medium'), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    version,
    ...timestamps,
  });
  await queryInterface.addIndex('styles', ['studio_id', 'name'], { unique: true, name: 'styles_studio_name' });

  const optionalId = { type: DataTypes.INTEGER.UNSIGNED, allowNull: true };
  const when = { type: DataTypes.DATE(3), allowNull: true };
  const note = { type: DataTypes.STRING(1000), allowNull: true };
  await queryInterface.createTable('drafts', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    client_id: ref('clients'),
    block_id: ref('blocks'),
    style_id: ref('styles'),
    fabric_id: ref('fabrics'),
    unit: { type: DataTypes.ENUM('in', 'cm'), allowNull: false },
    params: { type: DataTypes.TEXT('medium'), allowNull: false },
    due_on: { type: DataTypes.DATEONLY, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    state: { type: DataTypes.ENUM(...DRAFT_STATES), allowNull: false, defaultValue: 'drafting' },
    state_changed_at: { type: DataTypes.DATE(3), allowNull: false },
    revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    approved_revision: optionalId,
    approved_engine_version: { type: DataTypes.STRING(32), allowNull: true },
    approved_at: when,
    approved_by: userRef(),
    cut_at: when,
    cut_by: userRef(),
    cut_fabric_id: ref('fabrics', true),
    cut_note: note,
    sewn_at: when,
    sewn_by: userRef(),
    sewn_note: note,
    delivered_at: when,
    delivered_by: userRef(),
    delivered_note: note,
    created_by: userRef(),
    version,
    ...timestamps,
  });
  await queryInterface.addIndex('drafts', ['studio_id', 'state', 'state_changed_at']);
  await queryInterface.addIndex('drafts', ['studio_id', 'client_id', 'updated_at']);
  await queryInterface.addIndex('drafts', ['block_id', 'updated_at']);
  await queryInterface.addIndex('drafts', ['studio_id', 'updated_at']);

  await queryInterface.createTable('draft_revisions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    studio_id: ref('studios'),
    draft_id: ref('drafts', false, 'CASCADE'),
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    kind: { type: DataTypes.ENUM(...REVISION_KINDS), allowNull: false },
    restored_from: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    user_id: userRef(),
    snapshot: { type: DataTypes.TEXT('medium'), allowNull: false },
    changes: { type: DataTypes.TEXT('medium'), allowNull: false },
    input: { type: DataTypes.TEXT('medium'), allowNull: false },
    computed: { type: DataTypes.TEXT('medium'), allowNull: false },
    engine_version: { type: DataTypes.STRING(32), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('draft_revisions', ['draft_id', 'number'], { unique: true, name: 'draft_revisions_draft_number' });
}

export async function down({ queryInterface }: MigrationContext): Promise<void> {
  await queryInterface.dropTable('draft_revisions');
  await queryInterface.dropTable('drafts');
  await queryInterface.dropTable('styles');
  await queryInterface.dropTable('block_corrections');
  await queryInterface.dropTable('blocks');
}
