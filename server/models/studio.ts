import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type StudioUnit = 'in' | 'cm';

export class Studio extends Model<InferAttributes<Studio>, InferCreationAttributes<Studio>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare defaultUnit: CreationOptional<StudioUnit>;
  declare defaultPaper: CreationOptional<string>;
  declare seamAllowanceMm: CreationOptional<number>;
  declare hemAllowanceMm: CreationOptional<number>;
  declare bindingRatio: CreationOptional<number>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Studio.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        defaultUnit: { type: DataTypes.ENUM('in', 'cm'), allowNull: false, defaultValue: 'in' },
        defaultPaper: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'letter' },
        // mariadb returns DECIMAL as a string; the app works in numbers.
        seamAllowanceMm: {
          type: DataTypes.DECIMAL(6, 2),
          allowNull: false,
          defaultValue: 6.35,
          get() {
            return Number(this.getDataValue('seamAllowanceMm'));
          },
        },
        hemAllowanceMm: {
          type: DataTypes.DECIMAL(6, 2),
          allowNull: false,
          defaultValue: 12.7,
          get() {
            return Number(this.getDataValue('hemAllowanceMm'));
          },
        },
        bindingRatio: {
          type: DataTypes.DECIMAL(4, 3),
          allowNull: false,
          defaultValue: 1,
          get() {
            return Number(this.getDataValue('bindingRatio'));
          },
        },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'studios', version: true },
    );
  }
}
