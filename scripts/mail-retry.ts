import { resolveDatabaseUrl } from "./lib/database-url";

// Sends every outbox message that SMTP has not accepted yet (SMTP_URL, or the local fake).
process.env.DATABASE_URL = await resolveDatabaseUrl();
const { retryUnsentMail } = await import("~/mail/mailer.server");
const { pool } = await import("~/db/client.server");
const { sent, failed } = await retryUnsentMail();
console.log(`[turnledger] mail retry: ${sent} sent, ${failed} still waiting.`);
await pool.end();
