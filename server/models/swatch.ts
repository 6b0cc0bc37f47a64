import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Fabric } from './fabric.js';
import { storedImageColumns } from './stored-image.js';
import type { Studio } from './studio.js';
import type { User } from './user.js';

/** The swatch photo of a fabric (one per fabric); a new upload replaces the row's files. */
export class Swatch extends Model<InferAttributes<Swatch>, InferCreationAttributes<Swatch>> {
  declare id: CreationOptional<number>;
  declare studioId: ForeignKey<Studio['id']>;
  declare fabricId: ForeignKey<Fabric['id']>;
  declare fullKey: string;
  declare thumbKey: string;
  declare contentType: string;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare thumbWidth: number;
  declare thumbHeight: number;
  declare uploadedById: ForeignKey<User['id']> | null;
  declare uploadedByName: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Swatch.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        fabricId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        ...storedImageColumns,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'swatches' },
    );
  }
}
