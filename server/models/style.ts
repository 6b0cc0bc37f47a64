import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { GARMENTS, type Garment, type ParamsMm } from '../../shared/schemas/style.js';
import { jsonText } from './json-text.js';

/** A studio's saved style: a garment, the racer-back option and default parameter values (mm). */
export class Style extends Model<InferAttributes<Style>, InferCreationAttributes<Style>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare name: string;
  declare garment: Garment;
  declare racerBack: boolean;
  declare defaults: ParamsMm;
  declare notes: string;
  declare archived: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Style.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        garment: { type: DataTypes.ENUM(...GARMENTS), allowNull: false },
        racerBack: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        defaults: jsonText<Style>('defaults'),
        notes: { type: DataTypes.TEXT, allowNull: false },
        archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'styles', version: true },
    );
  }
}
