import { stopLocalMariadb } from "./lib/local-mariadb";

const stopped = await stopLocalMariadb();
console.log(
  stopped
    ? "[turnledger] MariaDB stopped."
    : "[turnledger] MariaDB was not running.",
);
