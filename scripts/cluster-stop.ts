/** npm run cluster:stop: stops the Galera cluster of npm run cluster:start, node 3 first, node 1 last. */
import { projectGaleraCluster, stopGaleraCluster } from "./lib/galera-cluster";

const stopped = await stopGaleraCluster(projectGaleraCluster());
console.log(
  stopped
    ? `[turnledger] Galera cluster stopped (${stopped} node${stopped === 1 ? "" : "s"}).`
    : "[turnledger] no Galera node was running.",
);
