// One decided review of one revision: a first review or a blind second one.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { Decision } from '../../shared/review';
import { numericColumn } from './columns';

export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare revisionNumber: number;
  declare reviewerId: number;
  declare rubricId: number;
  declare kind: 'primary' | 'blind_second';
  declare score: number | null;
  declare passed: boolean;
  declare decision: Decision;
  declare claimedAt: Date | null;
  declare decidedAt: Date;
  declare dueAt: Date;
  declare note: string | null;

  static initModel(sequelize: Sequelize) {
    Review.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        revisionNumber: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        rubricId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM('primary', 'blind_second'), allowNull: false },
        score: numericColumn(DataTypes.DECIMAL(4, 1), 'score', { allowNull: true }),
        passed: { type: DataTypes.BOOLEAN, allowNull: false },
        decision: { type: DataTypes.ENUM('accept', 'rework', 'recapture'), allowNull: false },
        claimedAt: { type: DataTypes.DATE(3), allowNull: true },
        decidedAt: { type: DataTypes.DATE(3), allowNull: false },
        dueAt: { type: DataTypes.DATE(3), allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: true },
      },
      { sequelize, tableName: 'reviews', timestamps: false },
    );
  }
}
