/**
 * The scale group's buffer pool. The project's MariaDB runs with a 256 MB InnoDB buffer
 * pool, sized for the tests (scripts/lib/local-mariadb.ts). The 10 M store is about
 * 2.7 GB, most of it the movements table: at 256 MB an item page reads its movements'
 * pages from the operating system instead of the pool, and the comparison of the two
 * sizes would measure the pool's size rather than the app's queries. A shop with 10 M
 * movements gives its database a pool that holds the data it works on (common practice:
 * most of a dedicated database server's memory).
 *
 * So while the scale group runs, both sizes are measured with the same larger pool: it is
 * raised (MariaDB resizes it while running) and put back afterwards. Only on the bench's
 * own local instance; a TEST_DATABASE_URL server is left as its owner configured it.
 */
import os from "node:os";
import { connectAsRoot } from "../scripts/lib/local-mariadb";

const megabyte = 1024 * 1024;

/** The pool the scale group asks for: 3 GB, or a quarter of the machine's memory if less. */
export function scaleBufferPoolBytes(totalMemoryBytes = os.totalmem()): number {
  const wanted = 3072 * megabyte;
  const quarter = Math.floor(totalMemoryBytes / 4 / (128 * megabyte)) * 128;
  return Math.min(wanted, quarter * megabyte);
}

async function poolSize(connection: Awaited<ReturnType<typeof connectAsRoot>>) {
  const [rows] = await connection.query(
    "SELECT @@innodb_buffer_pool_size AS size",
  );
  return Number((rows as { size: number | string }[])[0]!.size);
}

async function resizePool(bytes: number): Promise<number> {
  const connection = await connectAsRoot();
  try {
    await connection.query("SET GLOBAL innodb_buffer_pool_size = ?", [bytes]);
    // The resize runs in the background; wait until the new size is in effect.
    for (let waited = 0; waited < 60_000; waited += 250) {
      const [rows] = await connection.query(
        "SHOW STATUS LIKE 'Innodb_buffer_pool_resize_status'",
      );
      const status = String(
        (rows as { Value: string }[])[0]?.Value ?? "",
      ).toLowerCase();
      // Empty, or "Completed resizing buffer pool at …", once it is done.
      if (status === "" || status.startsWith("completed")) break;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    return await poolSize(connection);
  } finally {
    await connection.end();
  }
}

/**
 * Runs `work` with the local instance's buffer pool at least `bytes`, then puts the
 * earlier size back. Returns what `work` returned and the pool size it ran with (null
 * when the database is not the bench's local instance and was left alone).
 */
export async function withBufferPool<T>(
  bytes: number,
  work: () => Promise<T>,
): Promise<{ result: T; poolBytes: number | null }> {
  if (process.env.TEST_DATABASE_URL)
    return { result: await work(), poolBytes: null };
  const connection = await connectAsRoot();
  const before = await poolSize(connection).finally(() => connection.end());
  if (before >= bytes) return { result: await work(), poolBytes: before };
  const during = await resizePool(bytes);
  try {
    return { result: await work(), poolBytes: during };
  } finally {
    await resizePool(before);
  }
}
