/**
 * When the demo company (people with a published password, stock, designs)
 * goes into a database: on the project's private MariaDB, which is a laptop's
 * demo by definition, or when asked with `--demo` or DEMO_DATA=1. A database
 * given by DATABASE_URL is a real shop's and gets no people unless asked.
 */
export function demoDataWanted(options: {
  privateDatabase: boolean;
  argv: readonly string[];
  env: NodeJS.ProcessEnv;
}): boolean {
  return (
    options.privateDatabase ||
    options.argv.includes("--demo") ||
    options.env.DEMO_DATA === "1"
  );
}

/** The private MariaDB is used when DATABASE_URL is not set (scripts/lib/database-url.ts). */
export function usesPrivateDatabase(env: NodeJS.ProcessEnv): boolean {
  return !env.DATABASE_URL;
}

/** What to tell an operator whose database has nobody who can sign in. */
export const firstAdminHint =
  "Nobody can sign in yet. Create the first admin with\n" +
  "    npm run admin:create -- you@example.com\n" +
  "which prints a one-time link to choose a password.";
