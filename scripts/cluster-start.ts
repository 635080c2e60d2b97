/**
 * npm run cluster:start: a three-node MariaDB Galera cluster on 127.0.0.1 with
 * its data in .data/galera/ (GALERA_BASE_PORT, default 3340: SQL on 3340–3342,
 * gcomm 3343–3345, IST 3346–3348, SST 3349–3351). Installs galera-4 and
 * mariadb-backup from Debian when missing. `-- --fresh` deletes the cluster's
 * data and starts a new one. Prints each node's DATABASE_URL.
 */
import {
  ensureGaleraCluster,
  projectGaleraCluster,
} from "./lib/galera-cluster";
import { appDatabaseName } from "./lib/local-mariadb";

const cluster = projectGaleraCluster();
const started = Date.now();
const { urlFor } = await ensureGaleraCluster(cluster, {
  fresh: process.argv.includes("--fresh"),
});
console.log(
  `[turnledger] Galera cluster "${cluster.name}" is running, 3 nodes Synced (${((Date.now() - started) / 1000).toFixed(1)} s). ` +
    `Data and logs in ${cluster.directory}.`,
);
for (const node of [0, 1, 2]) {
  console.log(
    `  node ${node + 1}: DATABASE_URL=${urlFor(node, appDatabaseName)}`,
  );
}
console.log(
  "[turnledger] migrate once through any node: DATABASE_URL=<a node's URL> npm run db:migrate. Stop with npm run cluster:stop.",
);
