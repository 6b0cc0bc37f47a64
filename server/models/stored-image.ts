import { DataTypes } from 'sequelize';

/** The columns a photo and a swatch share: their two stored files and what they are. */
export interface StoredImageAttributes {
  fullKey: string;
  thumbKey: string;
  contentType: string;
  width: number;
  height: number;
  bytes: number;
  thumbWidth: number;
  thumbHeight: number;
  uploadedById: number | null;
  uploadedByName: string;
}

export const storedImageColumns = {
  fullKey: { type: DataTypes.STRING(200), allowNull: false },
  thumbKey: { type: DataTypes.STRING(200), allowNull: false },
  contentType: { type: DataTypes.STRING(40), allowNull: false },
  width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  thumbWidth: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  thumbHeight: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  uploadedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
  uploadedByName: { type: DataTypes.STRING(120), allowNull: false },
} as const;
