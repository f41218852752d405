// The project-local PostgreSQL that `npm start` and `npm test` rely on: created once, reused with
// its data on the next start, refused clearly when its port is taken by another program.
import net from 'node:net';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { destroyCluster, startCluster, stopCluster } from '../../api/dev/pg-cluster.mjs';

const name = 'integration-cluster';
const port = Number(process.env.COUPLET_IT_PG_PORT ?? 54369);

async function query(url: string, sql: string): Promise<unknown[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query(sql)).rows;
  } finally {
    await client.end();
  }
}

afterAll(() => destroyCluster(name));

describe('project-local PostgreSQL cluster', () => {
  it('keeps its data across a stop and a second start', async () => {
    destroyCluster(name);
    const first = await startCluster({ name, port, database: 'keep' });
    await query(first.url, 'CREATE TABLE kept (note text); INSERT INTO kept VALUES ($$cradle$$)');
    stopCluster(name);

    const second = await startCluster({ name, port, database: 'keep' });
    expect(second.url).toBe(first.url); // same password file: the cluster was reused, not rebuilt
    expect(await query(second.url, 'SELECT note FROM kept')).toEqual([{ note: 'cradle' }]);
    // Loopback only: the server must not listen on other interfaces.
    expect(await query(second.url, 'SHOW listen_addresses')).toEqual([
      { listen_addresses: '127.0.0.1' },
    ]);
    stopCluster(name);
  }, 60_000);

  it('says which port is taken when another program holds it', async () => {
    const squatter = net.createServer();
    await new Promise<void>((resolve) => squatter.listen(port, '127.0.0.1', resolve));
    try {
      await expect(
        startCluster({ name, port, database: 'keep', portVariable: 'COUPLET_IT_PG_PORT' }),
      ).rejects.toThrow(
        new RegExp(`port ${port} on 127.0.0.1 is taken.*set COUPLET_IT_PG_PORT to a free port`),
      );
    } finally {
      await new Promise((resolve) => squatter.close(resolve));
    }
  }, 60_000);
});
