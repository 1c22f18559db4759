import { DataTypes, type QueryInterface, QueryTypes } from 'sequelize';

// The rework-risk probability of each job's current revision, so the queue sorts by it from an
// index like every other queue order. Written at submit and rewritten after every fit.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('jobs', 'risk_probability', { type: DataTypes.DECIMAL(6, 5), allowNull: true });
  await queryInterface.addIndex('jobs', ['queue_open', 'risk_probability', 'effective_due_at', 'id'], { name: 'jobs_queue_risk' });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('ALTER TABLE jobs DROP INDEX jobs_queue_risk, DROP COLUMN risk_probability', {
    type: QueryTypes.RAW,
  });
}
