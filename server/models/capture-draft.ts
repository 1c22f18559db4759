import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CaptureRecord } from '../../shared/capture-record';

export class CaptureDraft extends Model<InferAttributes<CaptureDraft>, InferCreationAttributes<CaptureDraft>> {
  declare jobId: number;
  declare data: CaptureRecord;
  // Bumped on every save; lets a client notice that another device saved in between.
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CaptureDraft.init(
      {
        jobId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        data: { type: DataTypes.JSON, allowNull: false, get() { return parseJson(this.getDataValue('data')); } },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'capture_drafts' },
    );
  }
}

// MariaDB stores JSON as LONGTEXT, so the driver may hand back a string.
export function parseJson<T>(value: T | string): T {
  return typeof value === 'string' ? (JSON.parse(value) as T) : value;
}
