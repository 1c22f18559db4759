// A reviewer's unsaved scores for one claim; never shown to anyone else.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { ReviewDraftData } from '../../shared/review';
import { jsonColumn } from './columns';

export class ReviewDraft extends Model<InferAttributes<ReviewDraft>, InferCreationAttributes<ReviewDraft>> {
  declare draftKey: string;
  declare jobId: number;
  declare reviewerId: number;
  declare revisionNumber: number;
  declare data: ReviewDraftData;
  declare version: CreationOptional<number>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ReviewDraft.init(
      {
        draftKey: { type: DataTypes.STRING(40), primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        revisionNumber: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        data: jsonColumn('data'),
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'review_drafts', createdAt: false },
    );
  }
}
