import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { PhotoKind } from '../../shared/schemas/photo.js';
import type { Client } from './client.js';
import { storedImageColumns } from './stored-image.js';
import type { Studio } from './studio.js';
import type { User } from './user.js';

/** A fitting photo of a client; its files live in the storage adapter under `fullKey` and `thumbKey`. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare studioId: ForeignKey<Studio['id']>;
  declare clientId: ForeignKey<Client['id']>;
  declare kind: PhotoKind;
  /** YYYY-MM-DD. */
  declare takenOn: string;
  /** The measurement set's id (`setId`), or null. */
  declare measurementSetId: number | null;
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
    Photo.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM('front', 'side', 'back', 'other'), allowNull: false },
        takenOn: { type: DataTypes.DATEONLY, allowNull: false },
        measurementSetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        ...storedImageColumns,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos' },
    );
  }
}
