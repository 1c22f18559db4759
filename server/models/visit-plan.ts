import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { CameraClass } from '../../shared/capture-record';
import type { VisitPlan as VisitPlanData } from '../../shared/visit-plan';
import { jsonColumn, numericColumn } from './columns';

export class VisitPlanRow extends Model<InferAttributes<VisitPlanRow>, InferCreationAttributes<VisitPlanRow>> {
  declare jobId: number;
  declare data: VisitPlanData;
  // Bumped on every save, like the capture draft's: another device's save is noticed.
  declare version: CreationOptional<number>;
  declare plannedMinutes: number | null;
  declare actualMinutes: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    VisitPlanRow.init(
      {
        jobId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        data: jsonColumn('data'),
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        plannedMinutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        actualMinutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'visit_plans' },
    );
  }
}

export class CameraClassSetting extends Model<InferAttributes<CameraClassSetting>, InferCreationAttributes<CameraClassSetting>> {
  declare cameraClass: CameraClass;
  declare kitItems: string[];
  declare minutesPerStation: number | null;
  declare setupMinutes: number;
  declare version: CreationOptional<number>;
  declare updatedById: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CameraClassSetting.init(
      {
        cameraClass: { type: DataTypes.STRING(20), primaryKey: true },
        kitItems: jsonColumn('kitItems'),
        minutesPerStation: numericColumn(DataTypes.DECIMAL(4, 1), 'minutesPerStation', { allowNull: true }),
        setupMinutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        updatedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'camera_class_settings', createdAt: false },
    );
  }
}
