/**
 * The database pool's connections by state, for /metrics and /readyz.
 * mysql2 has no public figures for this; these are the core pool's own lists
 * (mysql2 3.x, lib/base/pool.js).
 */
import type { Pool as CorePool } from "mysql2";
import { pool } from "./client.server";

export interface PoolFigures {
  /** Connections lent to a request. */
  in_use: number;
  /** Connections open and free. */
  idle: number;
  /** Requests queued for a connection. */
  waiting: number;
}

export function poolFigures(): PoolFigures {
  const core = (pool as unknown as { pool: CorePool }).pool as unknown as {
    _allConnections?: { length: number };
    _freeConnections?: { length: number };
    _connectionQueue?: { length: number };
  };
  const all = core._allConnections?.length ?? 0;
  const idle = core._freeConnections?.length ?? 0;
  return {
    in_use: all - idle,
    idle,
    waiting: core._connectionQueue?.length ?? 0,
  };
}
