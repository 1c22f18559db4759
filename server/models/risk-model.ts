import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { RiskFigures, RiskModelView } from '../../shared/risk-hint';
import { jsonColumn } from './columns';

export class RiskModel extends Model<InferAttributes<RiskModel>, InferCreationAttributes<RiskModel>> {
  declare version: CreationOptional<number>;
  declare fittedAt: Date;
  declare reviews: number;
  declare factKeys: string[];
  declare coefficients: number[];
  declare standardErrors: number[];
  declare figures: RiskFigures;
  declare usable: boolean;
  declare withheld: string | null;

  static initModel(sequelize: Sequelize) {
    RiskModel.init(
      {
        version: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        fittedAt: { type: DataTypes.DATE(3), allowNull: false },
        reviews: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        factKeys: jsonColumn('factKeys'),
        coefficients: jsonColumn('coefficients'),
        standardErrors: jsonColumn('standardErrors'),
        figures: jsonColumn('figures'),
        usable: { type: DataTypes.BOOLEAN, allowNull: false },
        withheld: { type: DataTypes.STRING(300), allowNull: true },
      },
      { sequelize, tableName: 'risk_models', timestamps: false },
    );
  }

  toView(): RiskModelView {
    return {
      version: this.version,
      fittedAt: this.fittedAt.toISOString(),
      reviews: this.reviews,
      factKeys: this.factKeys,
      coefficients: this.coefficients,
      standardErrors: this.standardErrors,
      figures: this.figures,
      usable: this.usable,
      withheld: this.withheld,
    };
  }
}
