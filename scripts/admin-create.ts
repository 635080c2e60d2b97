/**
 * npm run admin:create -- you@example.com [--name "Your Name"]
 *
 * Makes the person an admin (creating the account when needed) and prints a
 * one-time link to choose a password, on APP_URL. For the first admin of a
 * new database, and for an admin locked out. Works on the private MariaDB or
 * on DATABASE_URL.
 */
import { parseArgs } from "node:util";
import { z } from "zod";
import { migrateDatabase } from "./lib/database-tasks";
import { requireAppUrlForLinks, resolveDatabaseUrl } from "./lib/database-url";

const usage =
  'Usage: npm run admin:create -- you@example.com [--name "Your Name"]';

const { positionals, values } = parseArgs({
  allowPositionals: true,
  options: { name: { type: "string" } },
});
const email = z.email().safeParse(positionals[0] ?? "");
if (!email.success || positionals.length !== 1) {
  console.error(`Give one e-mail address.\n${usage}`);
  process.exit(2);
}

requireAppUrlForLinks();
const databaseUrl = await resolveDatabaseUrl();
await migrateDatabase(databaseUrl);
process.env.DATABASE_URL = databaseUrl;
const { grantAdminAccess } = await import("~/people/first-admin.server");
const { pool } = await import("~/db/client.server");
try {
  const access = await grantAdminAccess({
    email: email.data,
    name: values.name,
  });
  console.log(
    `${access.created ? "Created" : "Made admin"}: ${email.data.toLowerCase()}\n` +
      `Open this link to choose the password (it works once, for ${access.validFor}):\n\n` +
      `    ${access.link}\n`,
  );
} finally {
  await pool.end();
}
