// Vitest global setup: gives the API and integration tests a real PostgreSQL on loopback.
// `npm test` starts the throwaway cluster itself and passes DATABASE_URL; a developer running
// `npx vitest` directly gets the same throwaway cluster, started here and stopped afterwards.
import { startCluster } from '../../api/dev/pg-cluster.mjs';

const testPort = Number(process.env.COUPLET_TEST_PG_PORT ?? 54339);

// The data folder is named after the port, so two runs on different ports never share (and stop)
// one cluster.
export const testCluster = {
  name: testPort === 54339 ? 'test' : `test-${testPort}`,
  port: testPort,
  portVariable: 'COUPLET_TEST_PG_PORT',
};

export default async function setup(): Promise<(() => void) | undefined> {
  if (process.env.DATABASE_URL || process.env.COUPLET_NO_DB === '1') return undefined;
  try {
    const cluster = await startCluster({
      ...testCluster,
      database: 'couplet_test',
      throwaway: true,
    });
    process.env.DATABASE_URL = cluster.url;
    return () => cluster.stop();
  } catch (error) {
    // Physics tests need no database; the database tests fail on their own with this reason.
    console.warn(`[tests] no PostgreSQL for this run: ${(error as Error).message}`);
    return undefined;
  }
}
