// A failing criterion sent back to the technician, with their answer and any dispute's outcome.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import { jsonColumn } from './columns';

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
