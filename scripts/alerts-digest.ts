import { requireAppUrlForLinks, resolveDatabaseUrl } from "./lib/database-url";

// The daily low-stock digest: one e-mail listing every open alert to each person who chose the
// digest on their account page. A scheduler (cron, a systemd timer) calls `npm run alerts:digest`.
requireAppUrlForLinks();
process.env.DATABASE_URL = await resolveDatabaseUrl();
const { sendAlertDigest } = await import("~/alerts/stock-alerts.server");
const { pool } = await import("~/db/client.server");
const { people, alerts } = await sendAlertDigest();
console.log(
  `[turnledger] alert digest: ${alerts} open alert${alerts === 1 ? "" : "s"}, sent to ${people} ${people === 1 ? "person" : "people"}.`,
);
await pool.end();
