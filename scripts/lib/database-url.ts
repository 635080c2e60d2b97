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
