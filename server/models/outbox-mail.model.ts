import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class OutboxMail extends Model<InferAttributes<OutboxMail>, InferCreationAttributes<OutboxMail>> {
  declare id: CreationOptional<number>;
  declare toAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  /** Extra headers as JSON (List-Unsubscribe and List-Unsubscribe-Post, RFC 8058), or null. */
  declare headers: CreationOptional<string | null>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare sentAt: CreationOptional<Date | null>;
  declare lastError: CreationOptional<string | null>;
  /** The instance sending it now, and until when its lease holds (see outbox.service.ts). */
  declare claimedBy: CreationOptional<string | null>;
  declare claimedUntil: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMail.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        headers: DataTypes.TEXT,
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
        sentAt: DataTypes.DATE,
        lastError: DataTypes.STRING(500),
        claimedBy: DataTypes.STRING(80),
        claimedUntil: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_outbox', modelName: 'OutboxMail', underscored: true },
    );
  }
}
