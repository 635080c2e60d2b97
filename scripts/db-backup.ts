import { backUpDatabase } from "./lib/database-backup";
import { resolveDatabaseUrl } from "./lib/database-url";

const backup = await backUpDatabase(await resolveDatabaseUrl());
// 1 MiB = 1,048,576 bytes (IEC 80000-13).
const mebibytes = (backup.bytes / 1_048_576).toFixed(2);
console.log(`[turnledger] backup written: ${backup.file}`);
console.log(`  size:   ${backup.bytes} bytes (${mebibytes} MiB)`);
console.log(`  sha256: ${backup.sha256} (also in ${backup.file}.sha256)`);
