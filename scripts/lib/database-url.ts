import { ensureLocalMariadb } from "./local-mariadb";

/** DATABASE_URL when set (no local server then); otherwise the private MariaDB, started as needed. */
export async function resolveDatabaseUrl(): Promise<string> {
  if (process.env.DATABASE_URL) {
    console.log(
      "[turnledger] DATABASE_URL is set: using that database, no local MariaDB.",
    );
    return process.env.DATABASE_URL;
  }
  return (await ensureLocalMariadb()).appUrl;
}

/**
 * Scripts that write links (admin:create, alerts:digest) run against a
 * shop's database (DATABASE_URL) need its public address too: without APP_URL
 * their links would point at http://localhost. Stops the script with a
 * message; on the private MariaDB, localhost is right.
 */
export function requireAppUrlForLinks(): void {
  if (process.env.DATABASE_URL && !process.env.APP_URL?.trim()) {
    console.error(
      "[turnledger] APP_URL is not set. With DATABASE_URL, set APP_URL to the public address people open " +
        "(as for the server), or the links this writes would point at http://localhost.",
    );
    process.exit(2);
  }
}
