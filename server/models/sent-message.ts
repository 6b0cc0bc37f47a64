import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A message the local SMTP sink received, as mailparser read it. Never changed once stored. */
export class SentMessage extends Model<InferAttributes<SentMessage>, InferCreationAttributes<SentMessage>> {
  declare id: CreationOptional<number>;
  declare studioId: number | null;
  declare messageId: string | null;
  declare fromAddress: string;
  declare fromName: string;
  /** The recipients, comma-separated, as the message's To header names them. */
  declare toAddresses: string;
  declare subject: string;
  /** The message's Date header. */
  declare sentAt: Date | null;
  declare receivedAt: Date;
  declare html: string | null;
  declare text: string | null;
  declare size: number;

  static initModel(sequelize: Sequelize): void {
    SentMessage.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        fromAddress: { type: DataTypes.STRING(254), allowNull: false },
        fromName: { type: DataTypes.STRING(255), allowNull: false },
        toAddresses: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.STRING(255), allowNull: false },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        receivedAt: { type: DataTypes.DATE(3), allowNull: false },
        html: { type: DataTypes.TEXT('medium'), allowNull: true },
        text: { type: DataTypes.TEXT('medium'), allowNull: true },
        size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      },
      { sequelize, tableName: 'sent_messages', timestamps: false },
    );
  }
}
