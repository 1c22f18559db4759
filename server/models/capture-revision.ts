import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { CaptureRecord } from '../../shared/capture-record';
import type { StoredFile } from '../../shared/files';
import type { CheckResult } from '../../shared/pre-submit-checks';
import type { StationAnalysis } from '../../shared/station-analysis';
import { jsonColumn } from './columns';

// Immutable once written (a database trigger refuses updates).
export class CaptureRevision extends Model<InferAttributes<CaptureRevision>, InferCreationAttributes<CaptureRevision>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare number: number;
  declare data: CaptureRecord;
  declare files: StoredFile[];
  declare findings: CheckResult;
  declare stationAnalysis: CreationOptional<StationAnalysis | null>;
  declare submittedById: number;
  declare submittedAt: Date;

  static initModel(sequelize: Sequelize) {
    CaptureRevision.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        data: jsonColumn('data'),
        files: jsonColumn('files'),
        findings: jsonColumn('findings'),
        stationAnalysis: jsonColumn('stationAnalysis', true),
        submittedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        submittedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'capture_revisions', timestamps: false },
    );
  }
}
