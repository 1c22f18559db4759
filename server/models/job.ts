import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';

import { CAMERA_CLASSES, type CameraClass } from '../../shared/capture-record';
import {
  JOB_STATUSES,
  type JobStatus,
  LOSS_TYPES,
  type LossType,
  PRIORITIES,
  type Priority,
  PROPERTY_TYPES,
  type PropertyType,
} from '../../shared/jobs';
import { numericColumn } from './columns';
import type { User } from './user';

export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<number>;
  declare claimReference: string;
  declare street: string;
  declare city: string;
  declare postcode: string;
  declare propertyType: PropertyType;
  declare lossType: LossType;
  declare lossDate: string;
  declare siteVisitDate: string | null;
  declare dueAt: Date;
  declare priority: CreationOptional<Priority>;
  declare status: CreationOptional<JobStatus>;
  declare currentRevision: CreationOptional<number>;
  declare cameraClass: CameraClass | null;
  declare submittedAt: Date | null;
  // Due time shifted by every pause while the job waited on the technician.
  declare effectiveDueAt: Date;
  declare pausedAt: Date | null;
  declare pausedMs: CreationOptional<number>;
  // The rework-risk model's probability for the current revision (null while it is withheld).
  declare riskProbability: CreationOptional<number | null>;
  declare claimedById: number | null;
  declare claimedAt: Date | null;
  declare claimExpiresAt: Date | null;
  declare clientName: string | null;
  declare adjusterName: string | null;
  declare adjusterEmail: string | null;
  declare policyholderName: string | null;
  declare policyholderPhone: string | null;
  declare accessNotes: string | null;
  declare technicianId: ForeignKey<User['id']>;
  declare createdById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare technician?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Job.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        claimReference: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        street: { type: DataTypes.STRING(160), allowNull: false },
        city: { type: DataTypes.STRING(80), allowNull: false },
        postcode: { type: DataTypes.STRING(16), allowNull: false },
        propertyType: { type: DataTypes.ENUM(...PROPERTY_TYPES), allowNull: false },
        lossType: { type: DataTypes.ENUM(...LOSS_TYPES), allowNull: false },
        lossDate: { type: DataTypes.DATEONLY, allowNull: false },
        siteVisitDate: { type: DataTypes.DATEONLY, allowNull: true },
        dueAt: { type: DataTypes.DATE(3), allowNull: false },
        priority: { type: DataTypes.ENUM(...PRIORITIES), allowNull: false, defaultValue: 'normal' },
        status: { type: DataTypes.ENUM(...JOB_STATUSES), allowNull: false, defaultValue: 'draft' },
        currentRevision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        cameraClass: { type: DataTypes.ENUM(...CAMERA_CLASSES), allowNull: true },
        submittedAt: { type: DataTypes.DATE(3), allowNull: true },
        effectiveDueAt: { type: DataTypes.DATE(3), allowNull: false },
        pausedAt: { type: DataTypes.DATE(3), allowNull: true },
        pausedMs: numericColumn(DataTypes.BIGINT.UNSIGNED, 'pausedMs', { defaultValue: 0 }),
        riskProbability: numericColumn(DataTypes.DECIMAL(6, 5), 'riskProbability', { allowNull: true }),
        claimedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        claimedAt: { type: DataTypes.DATE(3), allowNull: true },
        claimExpiresAt: { type: DataTypes.DATE(3), allowNull: true },
        clientName: { type: DataTypes.STRING(120), allowNull: true },
        adjusterName: { type: DataTypes.STRING(120), allowNull: true },
        adjusterEmail: { type: DataTypes.STRING(254), allowNull: true },
        policyholderName: { type: DataTypes.STRING(120), allowNull: true },
        policyholderPhone: { type: DataTypes.STRING(40), allowNull: true },
        accessNotes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'jobs' },
    );
  }
}
