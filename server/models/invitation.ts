import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Role } from './user.js';

/**
 * An invitation to join a studio with a role. The link's token is kept only as its SHA-256
 * hash; the invitation is open until accepted, revoked or past `expiresAt`.
 */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare sentCount: CreationOptional<number>;
  declare lastSentAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedUserId: CreationOptional<number | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.ENUM('owner', 'cutter'), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        invitedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        sentCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        lastSentAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        acceptedUserId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'invitations' },
    );
  }
}
