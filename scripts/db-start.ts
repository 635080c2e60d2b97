import { ensureLocalMariadb } from "./lib/local-mariadb";

if (process.env.DATABASE_URL) {
  console.log("[turnledger] DATABASE_URL is set: no local MariaDB is started.");
} else {
  await ensureLocalMariadb();
  console.log("[turnledger] MariaDB is running.");
}
