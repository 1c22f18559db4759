// One criterion's score within a review.
import { DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

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
