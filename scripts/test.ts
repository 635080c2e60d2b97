/**
 * npm test: makes sure Debian's Chromium is there for the browser tests
 * (installing it as root when missing), then runs every test with Vitest:
 * unit, integration against the private MariaDB, and browser tests. The
 * database, mail fake and app server are started by Vitest's global setup.
 */
import fs from "node:fs";
import path from "node:path";
import { projectRoot } from "./lib/project-paths";
import { installDebianPackages, runCommand } from "./lib/run-command";

const chromiumPath = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!fs.existsSync(chromiumPath)) {
  await installDebianPackages(["chromium"], `The browser tests need Chromium at ${chromiumPath}.`);
}

try {
  await runCommand(
    path.join(projectRoot, "node_modules", ".bin", "vitest"),
    ["run", ...process.argv.slice(2)],
    { cwd: projectRoot },
  );
} catch {
  process.exit(1);
}
