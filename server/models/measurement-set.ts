import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type ModelAttributes,
  type Sequelize,
} from 'sequelize';
import { MEASUREMENT_KEYS, type MeasurementKey } from '../../shared/schemas/measurement-fields.js';
import type { Client } from './client.js';
import type { Studio } from './studio.js';
import type { User } from './user.js';

/** The column attribute of a measurement: `bust` → `bustMm` (column `bust_mm`). */
export type MeasurementColumn = `${MeasurementKey}Mm`;

/** The attribute holding `key`, in mm. */
export function measurementColumn(key: MeasurementKey): MeasurementColumn {
  return `${key}Mm`;
}

/**
 * One version of a measurement set, taken at a fitting. A version is never changed after the
 * transaction that records it: a correction inserts the next version of the same `setId`, so
 * every earlier version stays readable. No `version: true` lock is needed for rows that are
 * never updated; the unique (setId, version) index refuses a second correction of one version.
 */
export class MeasurementSet extends Model<InferAttributes<MeasurementSet>, InferCreationAttributes<MeasurementSet>> {
  declare id: CreationOptional<number>;
  declare studioId: ForeignKey<Studio['id']>;
  declare clientId: ForeignKey<Client['id']>;
  /** The id of the set's first version; null only inside the transaction that inserts it. */
  declare setId: number | null;
  /** 1 as first taken, then one more per correction. */
  declare version: number;
  /** The fitting date, YYYY-MM-DD. */
  declare takenAt: string;
  declare takenById: ForeignKey<User['id']> | null;
  declare takenByName: string;
  declare recordedById: ForeignKey<User['id']> | null;
  declare recordedByName: string;
  declare bustMm: number | null;
  declare highBustMm: number | null;
  declare underbustMm: number | null;
  declare waistMm: number | null;
  declare hipMm: number | null;
  declare neckBaseMm: number | null;
  declare shoulderLengthMm: number | null;
  declare acrossBackMm: number | null;
  declare acrossFrontMm: number | null;
  declare napeToWaistMm: number | null;
  declare shoulderToBustMm: number | null;
  declare armholeDepthMm: number | null;
  declare shoulderToHipMm: number | null;
  declare upperArmMm: number | null;
  declare armLengthMm: number | null;
  declare wristMm: number | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    const valueColumns = Object.fromEntries(
      MEASUREMENT_KEYS.map((key) => [measurementColumn(key), { type: DataTypes.DOUBLE, allowNull: true }]),
    ) as Record<MeasurementColumn, { type: typeof DataTypes.DOUBLE; allowNull: true }>;
    const attributes: ModelAttributes<MeasurementSet, InferAttributes<MeasurementSet>> = {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      setId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      takenAt: { type: DataTypes.DATEONLY, allowNull: false },
      takenById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      takenByName: { type: DataTypes.STRING(120), allowNull: false },
      recordedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      recordedByName: { type: DataTypes.STRING(120), allowNull: false },
      ...valueColumns,
      notes: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    };
    MeasurementSet.init(attributes, { sequelize, tableName: 'measurement_sets' });
  }
}
