// Connection settings for sequelize-cli (CommonJS by its rules). The app reads the same
// variables through server/config/index.ts, so both always point at one database.
const connection = {
  dialect: 'mariadb',
  host: process.env.DB_HOST || '127.0.0.1',
  port: Number(process.env.DB_PORT || 3407),
  database: process.env.DB_NAME || 'sightline',
  username: process.env.DB_USER || 'sightline',
  password: process.env.DB_PASSWORD || 'sightline-local',
  logging: false,
  timezone: '+00:00',
  define: { underscored: false },
};

module.exports = { development: connection, test: connection, production: connection };
