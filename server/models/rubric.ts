// A versioned rubric; a saved version never changes, reviews keep the one they were scored under.
import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { Criterion } from '../../shared/rubric';
import { jsonColumn, numericColumn } from './columns';

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
