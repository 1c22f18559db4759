// Rubrics, reviews and what hangs off them.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Criterion } from '../../shared/rubric';
import { jsonColumn, numericColumn } from './columns';

export type Decision = 'accept' | 'rework' | 'recapture';

export class Rubric extends Model<InferAttributes<Rubric>, InferCreationAttributes<Rubric>> {
  declare id: CreationOptional<number>;
  declare version: number;
  declare passMark: number;
  declare criteria: Criterion[];
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Rubric.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, unique: true },
        passMark: numericColumn(DataTypes.DECIMAL(4, 1), 'passMark'),
        criteria: jsonColumn('criteria'),
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'rubrics', updatedAt: false },
    );
  }
}

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
      },
      { sequelize, tableName: 'reviews', timestamps: false },
    );
  }
}

export class ReviewScore extends Model<InferAttributes<ReviewScore>, InferCreationAttributes<ReviewScore>> {
  declare reviewId: number;
  declare criterionKey: string;
  declare score: number | null;
  declare maxScore: number;
  declare stockReason: string | null;
  declare comment: string | null;
  declare carriedOver: boolean;

  static initModel(sequelize: Sequelize) {
    ReviewScore.init(
      {
        reviewId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        criterionKey: { type: DataTypes.STRING(40), primaryKey: true },
        score: { type: DataTypes.TINYINT.UNSIGNED, allowNull: true },
        maxScore: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 4 },
        stockReason: { type: DataTypes.STRING(120), allowNull: true },
        comment: { type: DataTypes.TEXT, allowNull: true },
        carriedOver: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      },
      { sequelize, tableName: 'review_scores', timestamps: false },
    );
  }
}

export class ReworkItem extends Model<InferAttributes<ReworkItem>, InferCreationAttributes<ReworkItem>> {
  declare id: CreationOptional<number>;
  declare reviewId: number;
  declare jobId: number;
  declare criterionKey: string;
  declare title: string;
  declare instruction: string;
  declare stockReason: string | null;
  declare response: 'fixed' | 'cannot_fix' | 'disputed' | null;
  declare responseNote: string | null;
  declare responseFileIds: CreationOptional<number[] | null>;
  declare respondedAt: Date | null;
  declare disputeOutcome: 'upheld' | 'withdrawn' | null;
  declare disputeNote: string | null;
  declare disputeDecidedById: number | null;
  declare disputeDecidedAt: Date | null;

  static initModel(sequelize: Sequelize) {
    ReworkItem.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        reviewId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        criterionKey: { type: DataTypes.STRING(40), allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        instruction: { type: DataTypes.TEXT, allowNull: false },
        stockReason: { type: DataTypes.STRING(120), allowNull: true },
        response: { type: DataTypes.ENUM('fixed', 'cannot_fix', 'disputed'), allowNull: true },
        responseNote: { type: DataTypes.TEXT, allowNull: true },
        responseFileIds: jsonColumn('responseFileIds', true),
        respondedAt: { type: DataTypes.DATE(3), allowNull: true },
        disputeOutcome: { type: DataTypes.ENUM('upheld', 'withdrawn'), allowNull: true },
        disputeNote: { type: DataTypes.TEXT, allowNull: true },
        disputeDecidedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        disputeDecidedAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'rework_items', timestamps: false },
    );
  }
}

export class SecondReview extends Model<InferAttributes<SecondReview>, InferCreationAttributes<SecondReview>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare revisionNumber: number;
  declare firstReviewId: number;
  declare firstReviewerId: number;
  declare secondReviewId: number | null;
  declare claimedById: number | null;
  declare claimExpiresAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SecondReview.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        revisionNumber: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        firstReviewId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        firstReviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        secondReviewId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        claimedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        claimExpiresAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'second_reviews', updatedAt: false },
    );
  }
}

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare actorId: number | null;
  declare type: string;
  declare data: object;
  declare createdAt: Date;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        type: { type: DataTypes.STRING(40), allowNull: false },
        data: jsonColumn('data'),
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'audit_events', timestamps: false },
    );
  }
}
