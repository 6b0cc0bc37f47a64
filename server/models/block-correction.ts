import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { CorrectionTarget } from '../../shared/schemas/block.js';
import { CORRECTION_TARGET_NAMES } from '../../shared/schemas/block.js';
import { decimalNumber } from './json-text.js';

/** One fit correction of a block: a signed amount (mm, or percentage points for an ease). */
export class BlockCorrection extends Model<InferAttributes<BlockCorrection>, InferCreationAttributes<BlockCorrection>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare blockId: number;
  declare target: CorrectionTarget;
  declare amount: number;
  declare note: string;
  /** "YYYY-MM-DD": the fitting where it was found. */
  declare notedOn: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BlockCorrection.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        blockId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        target: { type: DataTypes.ENUM(...CORRECTION_TARGET_NAMES), allowNull: false },
        amount: decimalNumber<BlockCorrection>('amount', 8, 2),
        note: { type: DataTypes.STRING(500), allowNull: false },
        notedOn: { type: DataTypes.DATEONLY, allowNull: false },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'block_corrections' },
    );
  }
}
