import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import { jsonColumn } from './columns';

export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare jobId: number | null;
  declare kind: string;
  declare dedupeKey: string | null;
  declare recipients: string[];
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  declare status: CreationOptional<'pending' | 'sent' | 'failed'>;
  declare attempts: CreationOptional<number>;
  declare lastError: string | null;
  declare nextAttemptAt: Date;
  declare lockedBy: string | null;
  declare lockedUntil: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare sentAt: Date | null;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        dedupeKey: { type: DataTypes.STRING(120), allowNull: true },
        recipients: jsonColumn('recipients'),
        subject: { type: DataTypes.STRING(200), allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.ENUM('pending', 'sent', 'failed'), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        lockedBy: { type: DataTypes.STRING(64), allowNull: true },
        lockedUntil: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'outbox', updatedAt: false },
    );
  }
}
