import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One attachment of a message the local SMTP sink received, with its bytes. */
export class SentMessageAttachment extends Model<InferAttributes<SentMessageAttachment>, InferCreationAttributes<SentMessageAttachment>> {
  declare id: CreationOptional<number>;
  declare sentMessageId: number;
  declare filename: string;
  declare contentType: string;
  declare size: number;
  declare content: Buffer;

  static initModel(sequelize: Sequelize): void {
    SentMessageAttachment.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        sentMessageId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        filename: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(127), allowNull: false },
        size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        content: { type: DataTypes.BLOB('long'), allowNull: false },
      },
      { sequelize, tableName: 'sent_message_attachments', timestamps: false },
    );
  }
}
