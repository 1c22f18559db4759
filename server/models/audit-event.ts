// One line of a job's timeline; the table refuses updates and deletes.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import { jsonColumn } from './columns';

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
