import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { CaptureRecord } from '../../shared/capture-record';
import { jsonColumn } from './columns';

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
        data: jsonColumn('data'),
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'capture_drafts' },
    );
  }
}
