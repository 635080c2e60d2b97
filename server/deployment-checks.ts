/**
 * What a production server checks before it listens: it refuses to start
 * where a real shop would be unsafe, and says how to fix it.
 *
 * - APP_URL is set and well-formed: every e-mailed link and the Host check
 *   come from it (app/lib/app-address.ts).
 * - The database server is MariaDB 10.6 or newer (docs/decisions/029).
 * - The database has exactly the migrations this build was made with: a
 *   server never migrates; behind, it says to run `npm run db:migrate`;
 *   ahead or foreign, that another version migrated it (docs/decisions/023).
 *   Demo servers too.
 * - No demo account signs in with the published demo password, unless the
 *   server is a demo (DEMO_DATA=1, which `npm start` sets on its private
 *   MariaDB and the tests set for theirs).
 */
import { inArray, isNotNull, like, or, and, sql } from "drizzle-orm";
import { defaultDemoPassword, demoPassword } from "~/auth/demo-password.server";
import { verifyPassword } from "~/auth/password.server";
import { db } from "~/db/client.server";
import { isDatabaseUnavailable, unavailableReason } from "~/db/database-errors";
import { databaseServerProblem } from "~/db/database-server-version";
import { schemaProblem } from "~/db/migration-history";
import { schemaStatus } from "~/db/schema-version.server";
import { users } from "~/db/schema";
import { parseAppUrl } from "~/lib/app-address";
import { demoPeople } from "../seed/demo-people";

/** True when this server is a demo on purpose (DEMO_DATA=1). */
export function isDemoServer(env: NodeJS.ProcessEnv = process.env): boolean {
  return env.DEMO_DATA === "1";
}

function appUrlProblem(env: NodeJS.ProcessEnv): string | null {
  const setting = env.APP_URL?.trim();
  if (!setting)
    return (
      "APP_URL is not set. A production server needs the public address people open, " +
      "e.g. APP_URL=https://turnledger.example.com: e-mailed links are built from it and " +
      "requests for any other host are refused. (`npm start` on a laptop sets it to " +
      "http://localhost:PORT itself.)"
    );
  try {
    parseAppUrl(setting);
    return null;
  } catch (error) {
    return (error as Error).message;
  }
}

/** Why the database server will not do (not MariaDB 10.6+), or null. */
async function serverVersionProblem(): Promise<string | null> {
  const [rows] = (await db.execute(
    sql`SELECT VERSION() AS version`,
  )) as unknown as [{ version: string }[]];
  return databaseServerProblem(rows[0]?.version ?? "");
}

/** The demo accounts (by e-mail or seeded id) that still sign in with a demo password. */
async function accountsWithDemoPassword(): Promise<string[]> {
  const candidates = await db
    .select({ email: users.email, passwordHash: users.passwordHash })
    .from(users)
    .where(
      and(
        isNotNull(users.passwordHash),
        or(
          inArray(
            users.email,
            demoPeople.map((person) => person.email),
          ),
          like(users.id, "demo-%"),
        ),
      ),
    )
    .limit(100);
  // The published default, and this installation's DEMO_PASSWORD.
  const passwords = [...new Set([defaultDemoPassword, demoPassword()])];
  const found: string[] = [];
  for (const candidate of candidates) {
    for (const password of passwords) {
      if (await verifyPassword(candidate.passwordHash!, password)) {
        found.push(candidate.email);
        break;
      }
    }
  }
  return found;
}

/** Why this production server must not start; empty when it may. */
export async function deploymentProblems(
  env: NodeJS.ProcessEnv = process.env,
): Promise<string[]> {
  // Vite's dev server (`npm run dev`) is a developer's machine; a built app
  // is checked whatever NODE_ENV says ("staging", unset, …).
  if (env.NODE_ENV === "development") return [];
  const problems: string[] = [];
  const appUrl = appUrlProblem(env);
  if (appUrl) problems.push(appUrl);
  let server: string | null;
  try {
    server = await serverVersionProblem();
  } catch (error) {
    if (!isDatabaseUnavailable(error)) throw error;
    return [
      ...problems,
      `The database cannot be reached (${unavailableReason(error)}), so the server cannot check that it has this version's migrations. ` +
        "Start it, or correct DATABASE_URL, then start the server again.",
    ];
  }
  if (server) return [...problems, server];
  // The account check below reads tables a database behind may not have yet.
  const schema = schemaProblem(await schemaStatus());
  if (schema) return [...problems, schema];
  if (!isDemoServer(env)) {
    const demoAccounts = await accountsWithDemoPassword();
    if (demoAccounts.length > 0)
      problems.push(
        `${demoAccounts.join(", ")} still sign${demoAccounts.length === 1 ? "s" : ""} in with the published demo password. ` +
          "Give each a new password (`npm run admin:create -- <e-mail>` prints a link to set one) " +
          "or deactivate it on the People page, then start again. " +
          "Only a demo server may keep them: start it with DEMO_DATA=1.",
      );
  }
  return problems;
}
