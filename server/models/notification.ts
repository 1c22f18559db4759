// One thing one person is told in the app; read once they mark it.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { NotificationKind } from '../../shared/notifications';

export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare jobId: number | null;
  declare kind: NotificationKind;
  declare text: string;
  declare createdAt: Date;
  declare readAt: Date | null;

  static initModel(sequelize: Sequelize) {
    Notification.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        text: { type: DataTypes.STRING(300), allowNull: false },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        readAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'notifications', timestamps: false },
    );
  }
}

// A person's e-mail choice for one kind; no row means the kind's default.
export class NotificationPref extends Model<InferAttributes<NotificationPref>, InferCreationAttributes<NotificationPref>> {
  declare userId: number;
  declare kind: NotificationKind;
  declare email: boolean;
  declare updatedAt: Date;

  static initModel(sequelize: Sequelize) {
    NotificationPref.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        kind: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
        email: { type: DataTypes.BOOLEAN, allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'notification_prefs', timestamps: false },
    );
  }
}
