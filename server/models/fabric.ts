import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Recovery } from '../../shared/fabric/stretch.js';
import type { Studio } from './studio.js';

/** A knit in the studio's store, with its tested stretch. Versioned: a stale change is refused. */
export class Fabric extends Model<InferAttributes<Fabric>, InferCreationAttributes<Fabric>> {
  declare id: CreationOptional<number>;
  declare studioId: ForeignKey<Studio['id']>;
  declare name: string;
  declare fibreContent: string | null;
  declare widthMm: number | null;
  declare weightGsm: number | null;
  /** Percent. */
  declare stretchCrosswise: number;
  /** Percent. */
  declare stretchLengthwise: number | null;
  declare recovery: Recovery;
  declare notes: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Fabric.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        fibreContent: { type: DataTypes.STRING(200), allowNull: true },
        widthMm: { type: DataTypes.DOUBLE, allowNull: true },
        weightGsm: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        // mariadb returns DECIMAL as a string; the app works in numbers.
        stretchCrosswise: {
          type: DataTypes.DECIMAL(4, 1),
          allowNull: false,
          get() {
            return Number(this.getDataValue('stretchCrosswise'));
          },
        },
        stretchLengthwise: {
          type: DataTypes.DECIMAL(4, 1),
          allowNull: true,
          get() {
            const value = this.getDataValue('stretchLengthwise');
            return value === null || value === undefined ? null : Number(value);
          },
        },
        recovery: { type: DataTypes.ENUM('good', 'fair', 'poor'), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fabrics', version: true },
    );
  }
}
