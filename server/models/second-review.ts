// A revision drawn for a blind second review, and who holds its claim.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

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
