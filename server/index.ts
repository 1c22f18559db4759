import { createApp } from './app';
import { config } from './config';
import { sequelize } from './models';
import { startOutboxWorker } from './workers/outbox-worker';

async function main() {
  await sequelize.authenticate();
  const app = createApp();
  const server = app.listen(config.port, config.host, () => {
    console.log(`Sightline API and web app on http://${config.host}:${config.port}`);
  });
  const stopWorker = startOutboxWorker();
  const stop = () => {
    stopWorker();
    server.close(() => sequelize.close().finally(() => process.exit(0)));
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  console.error('Sightline could not start:', err);
  process.exit(1);
});
