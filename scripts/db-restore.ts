import { parseArgs } from "node:util";
import { resolveDatabaseUrl } from "./lib/database-url";
import { RestoreRefused, restoreDatabase } from "./lib/database-restore";

const usage = "Usage: npm run db:restore -- FILE [--into-name NAME] [--force]";

let parsed;
try {
  parsed = parseArgs({
    allowPositionals: true,
    options: {
      "into-name": { type: "string" },
      force: { type: "boolean", default: false },
    },
  });
} catch (error) {
  console.error(`[turnledger] ${(error as Error).message}\n${usage}`);
  process.exit(2);
}
const [file, ...extra] = parsed.positionals;
if (!file || extra.length > 0) {
  console.error(usage);
  process.exit(2);
}

try {
  const restored = await restoreDatabase(file, await resolveDatabaseUrl(), {
    intoName: parsed.values["into-name"],
    force: parsed.values.force,
  });
  console.log(
    `[turnledger] restored into ${new URL(restored).pathname.slice(1)}.`,
  );
} catch (error) {
  if (!(error instanceof RestoreRefused)) throw error;
  console.error(`[turnledger] ${error.message}`);
  process.exit(1);
}
