import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { BlockCorrection } from './block-correction.js';

/** A client's fitted base: one measurement set plus the fit corrections (block_corrections). */
export class Block extends Model<InferAttributes<Block>, InferCreationAttributes<Block>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare clientId: number;
  declare measurementSetId: number;
  declare name: string;
  declare notes: string;
  declare createdBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare corrections?: NonAttribute<BlockCorrection[]>;

  static initModel(sequelize: Sequelize): void {
    Block.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        measurementSetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'blocks', version: true },
    );
  }
}
