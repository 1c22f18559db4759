import { DataTypes, type QueryInterface } from 'sequelize';

// The rework-risk model, one row per fit: its coefficients, the reviews it learnt from and its
// held-out figures. Rows are never changed; the newest is the one in use.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('risk_models', {
    version: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    fitted_at: { type: DataTypes.DATE(3), allowNull: false },
    reviews: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    fact_keys: { type: DataTypes.JSON, allowNull: false },
    coefficients: { type: DataTypes.JSON, allowNull: false },
    standard_errors: { type: DataTypes.JSON, allowNull: false },
    figures: { type: DataTypes.JSON, allowNull: false },
    usable: { type: DataTypes.BOOLEAN, allowNull: false },
    withheld: { type: DataTypes.STRING(300), allowNull: true },
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('risk_models');
}
