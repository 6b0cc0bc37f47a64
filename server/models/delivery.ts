import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { DELIVERY_KINDS, DELIVERY_STATUSES, type DeliveryKind, type DeliveryStatus } from '../../shared/schemas/mail.js';

/**
 * One e-mail the studio sent: what kind, to whom, on which client or draft, by whom, and how
 * the sending went. Written before the message leaves, with the Message-ID it will carry, so the
 * local sink can tell whose message it received.
 */
export class Delivery extends Model<InferAttributes<Delivery>, InferCreationAttributes<Delivery>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare kind: DeliveryKind;
  declare clientId: number | null;
  declare draftId: number | null;
  declare invitationId: number | null;
  declare toAddress: string;
  declare subject: string;
  declare messageId: string;
  declare status: CreationOptional<DeliveryStatus>;
  declare error: CreationOptional<string | null>;
  declare sentBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Delivery.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM(...DELIVERY_KINDS), allowNull: false },
        clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        draftId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        invitationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(255), allowNull: false },
        messageId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        status: { type: DataTypes.ENUM(...DELIVERY_STATUSES), allowNull: false, defaultValue: 'sending' },
        error: { type: DataTypes.STRING(500), allowNull: true },
        sentBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'deliveries' },
    );
  }
}
