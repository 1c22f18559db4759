// npm run trends:rebuild: recompute the weekly trend rollups from the raw reviews.
import { sequelize } from '../server/db';
import { rebuildTrendRollups } from '../server/services/trend-rollup-service';

const started = Date.now();
rebuildTrendRollups()
  .then(() => console.log(`trend rollups rebuilt in ${Date.now() - started} ms`))
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => sequelize.close());
