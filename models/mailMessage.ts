import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A message as the local fake SMTP server received it (the admin's outbox). */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare messageId: string | null;
  declare envelopeFrom: string;
  /** Envelope recipients, comma-separated. */
  declare envelopeTo: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare receivedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initMailMessage(sequelize: Sequelize): void {
  MailMessage.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      messageId: { type: DataTypes.STRING(255), allowNull: true },
      envelopeFrom: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
      envelopeTo: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
      subject: { type: DataTypes.STRING(255), allowNull: false, defaultValue: '' },
      textBody: { type: DataTypes.TEXT('medium'), allowNull: false },
      htmlBody: { type: DataTypes.TEXT('medium'), allowNull: true },
      receivedAt: { type: DataTypes.DATE(3), allowNull: false },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'MailMessage', tableName: 'mail_outbox' },
  );
}
