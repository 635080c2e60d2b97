/**
 * What the Galera tests start beside the shared test environment: a three-node
 * MariaDB Galera cluster of their own (scripts/lib/galera-cluster.ts), made
 * afresh for each run, with the test database migrated and seeded once through
 * node 1, and the URLs, connections and checks the tests need on every node.
 *
 * Ports follow the run's own TEST_PORT, so a second run beside this one gets
 * others: the cluster's SQL, gcomm, IST and SST ports are TEST_PORT + 80 … + 91
 * (data in .data/galera-test-<TEST_PORT + 80>/), its two app servers + 92, + 93.
 */
import path from "node:path";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import {
  migrateDatabase,
  seedWhenEmpty,
} from "../../scripts/lib/database-tasks";
import {
  ensureGaleraCluster,
  galeraCluster,
  galeraPortsFrom,
  killGaleraNode,
  restartGaleraNode,
  stopGaleraCluster,
  type GaleraCluster,
} from "../../scripts/lib/galera-cluster";
import { dataRoot } from "../../scripts/lib/project-paths";

const testPort = Number(process.env.TEST_PORT ?? 3100);

export const galeraTestPorts = {
  cluster: galeraPortsFrom(testPort + 80),
  apps: [testPort + 92, testPort + 93] as const,
};

export class GaleraTestCluster {
  private pools = new Map<number, mysql.Pool>();

  private constructor(
    readonly cluster: GaleraCluster,
    readonly databaseName: string,
    private readonly urls: string[],
  ) {}

  /** `smtpUrl`: where the seed's low-stock mail goes. */
  static async start(options: { smtpUrl: string }): Promise<GaleraTestCluster> {
    const cluster = galeraCluster({
      directory: path.join(
        dataRoot,
        `galera-test-${galeraTestPorts.cluster.sql[0]}`,
      ),
      ports: galeraTestPorts.cluster,
    });
    const databaseName = "turnledger_test_galera";
    const { urlFor } = await ensureGaleraCluster(cluster, {
      databases: [databaseName],
      fresh: true,
    });
    const urls = [0, 1, 2].map((node) => urlFor(node, databaseName));
    // Once, through node 1: the other nodes receive every table and row.
    await migrateDatabase(urls[0]!);
    const smtpUrl = process.env.SMTP_URL;
    process.env.SMTP_URL = options.smtpUrl;
    try {
      await seedWhenEmpty(urls[0]!, { quiet: true });
    } finally {
      if (smtpUrl === undefined) delete process.env.SMTP_URL;
      else process.env.SMTP_URL = smtpUrl;
    }
    return new GaleraTestCluster(cluster, databaseName, urls);
  }

  /** The application's DATABASE_URL on node `node` (0, 1 or 2). */
  urlFor(node: number): string {
    return this.urls[node]!;
  }

  /**
   * A small pool of the application's user on node `node`. Its reads wait
   * until the node has applied everything committed anywhere in the cluster
   * before they run (wsrep_sync_wait = 1), so a check on node 3 sees what a
   * request through node 1 has just committed.
   */
  pool(node: number): mysql.Pool {
    let pool = this.pools.get(node);
    if (!pool) {
      pool = mysql.createPool({
        ...poolOptionsFromUrl(this.urlFor(node)),
        connectionLimit: 2,
      });
      pool.on("connection", (connection) => {
        connection.query("SET SESSION wsrep_sync_wait = 1");
      });
      this.pools.set(node, pool);
    }
    return pool;
  }

  async query<Row>(
    node: number,
    sql: string,
    values: unknown[] = [],
  ): Promise<Row[]> {
    const [rows] = await this.pool(node).query(sql, values);
    return rows as Row[];
  }

  /**
   * A digest of every table of the test database on node `node`, after the
   * node has caught up with the cluster: its row count and two sums over its
   * rows (CRC32 and 64 bits of MD5 of each row's quoted columns, in column
   * order). Equal on two nodes when they hold the same rows.
   *
   * Not CHECKSUM TABLE: in one run it disagreed between nodes on the two
   * tables with stored generated columns (items, stock_alerts) while every
   * other table agreed, and after a restart of the cluster the same nodes
   * agreed and their rows compared equal one by one.
   */
  async tableDigests(node: number): Promise<Record<string, string>> {
    const connection = await mysql.createConnection(
      poolOptionsFromUrl(this.urlFor(node)),
    );
    try {
      await connection.query("SET SESSION wsrep_sync_wait = 1");
      const [columns] = await connection.query(
        `SELECT table_name AS tableName, column_name AS columnName
           FROM information_schema.columns
          WHERE table_schema = DATABASE()
          ORDER BY table_name, ordinal_position`,
      );
      const byTable = new Map<string, string[]>();
      for (const { tableName, columnName } of columns as {
        tableName: string;
        columnName: string;
      }[]) {
        byTable.set(tableName, [
          ...(byTable.get(tableName) ?? []),
          `QUOTE(\`${columnName}\`)`,
        ]);
      }
      const digests: Record<string, string> = {};
      for (const [table, quoted] of byTable) {
        const row = `CONCAT_WS(',', ${quoted.join(", ")})`;
        const [rows] = await connection.query(
          `SELECT COUNT(*) AS n, COALESCE(SUM(CRC32(${row})), 0) AS crc,
                  BIT_XOR(CAST(CONV(LEFT(MD5(${row}), 16), 16, 10) AS UNSIGNED)) AS md5
             FROM \`${table}\``,
        );
        const [digest] = rows as { n: number; crc: string; md5: string }[];
        digests[table] = `${digest!.n}:${digest!.crc}:${digest!.md5}`;
      }
      return digests;
    } finally {
      await connection.end();
    }
  }

  /** SIGKILL to node `node`'s mariadbd (its pool is closed first, as the node's clients lose it). */
  async kill(node: number): Promise<void> {
    await this.closePool(node);
    await killGaleraNode(this.cluster, node);
  }

  /** Starts node `node` again; resolves once all three nodes are Synced. */
  async restart(node: number): Promise<void> {
    await restartGaleraNode(this.cluster, node);
  }

  private async closePool(node: number): Promise<void> {
    const pool = this.pools.get(node);
    this.pools.delete(node);
    await pool?.end().catch(() => undefined);
  }

  async stop(): Promise<void> {
    for (const node of [...this.pools.keys()]) await this.closePool(node);
    await stopGaleraCluster(this.cluster);
  }
}

/** How many answers had each status, e.g. { 201: 20, 409: 80 }. */
export function statusCounts(statuses: number[]): Record<number, number> {
  const counts: Record<number, number> = {};
  for (const status of statuses) counts[status] = (counts[status] ?? 0) + 1;
  return counts;
}
