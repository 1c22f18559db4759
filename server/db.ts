import { Sequelize } from 'sequelize';

import { config } from './config';

export const sequelize = new Sequelize(config.db.name, config.db.user, config.db.password, {
  dialect: 'mariadb',
  host: config.db.host,
  port: config.db.port,
  logging: false,
  // Every instance reads and writes times in UTC, whatever the host's zone.
  timezone: '+00:00',
  define: { underscored: true },
  pool: { max: 10, min: 0, idle: 10_000 },
});
