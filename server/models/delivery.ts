// A summary to build (and, on acceptance, to send): leased by one worker at a time.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

export class Delivery extends Model<InferAttributes<Delivery>, InferCreationAttributes<Delivery>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare notify: boolean;
  declare requestedById: number | null;
  declare status: CreationOptional<'pending' | 'built' | 'failed'>;
  declare attempts: CreationOptional<number>;
  declare lastError: string | null;
  declare nextAttemptAt: Date;
  declare lockedBy: string | null;
  declare lockedUntil: Date | null;
  declare fileId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare builtAt: Date | null;

  static initModel(sequelize: Sequelize) {
    Delivery.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        notify: { type: DataTypes.BOOLEAN, allowNull: false },
        requestedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        status: { type: DataTypes.ENUM('pending', 'built', 'failed'), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        lockedBy: { type: DataTypes.STRING(64), allowNull: true },
        lockedUntil: { type: DataTypes.DATE(3), allowNull: true },
        fileId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE(3),
        builtAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'deliveries', updatedAt: false },
    );
  }
}
