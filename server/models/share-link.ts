// A read-only link to a job's delivery page for the adjuster; only the token's hash is kept.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare tokenHash: string;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare expiresAt: Date;
  declare revokedAt: Date | null;

  static initModel(sequelize: Sequelize) {
    ShareLink.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE(3),
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'share_links', updatedAt: false },
    );
  }
}
