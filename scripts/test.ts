/**
 * npm test: makes sure the Debian tools the tests use are there (Chromium for
 * the browser tests, GNU units for reference checks; installed as root when
 * missing), then runs every test
 * with Vitest: unit, integration against the private MariaDB, and browser
 * tests. The database, mail fake and app server are started by Vitest's
 * global setup. Ends with one line "Tests: N passed, N failed".
 */
import fs from "node:fs";
import path from "node:path";
import { dataRoot, projectRoot } from "./lib/project-paths";
import { installDebianPackages, runCommand } from "./lib/run-command";

const chromiumPath = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const missing: string[] = [];
if (!fs.existsSync(chromiumPath)) missing.push("chromium");
// GNU units is the independent reference for the AWG formula (wiregauge(n)).
if (!fs.existsSync("/usr/bin/units")) missing.push("units");
if (missing.length > 0) {
  await installDebianPackages(
    missing,
    `The tests need ${missing.join(" and ")} (browser tests, reference checks).`,
  );
}

fs.mkdirSync(dataRoot, { recursive: true });
const reportFile = path.join(dataRoot, "vitest-report.json");
fs.rmSync(reportFile, { force: true });

let failed = false;
try {
  await runCommand(
    path.join(projectRoot, "node_modules", ".bin", "vitest"),
    [
      "run",
      "--reporter=default",
      "--reporter=json",
      `--outputFile.json=${reportFile}`,
      ...process.argv.slice(2),
    ],
    { cwd: projectRoot },
  );
} catch {
  failed = true;
}

if (fs.existsSync(reportFile)) {
  const report = JSON.parse(fs.readFileSync(reportFile, "utf8")) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
  };
  const skipped =
    report.numPendingTests > 0 ? `, ${report.numPendingTests} skipped` : "";
  console.log(
    `\nTests: ${report.numPassedTests} passed, ${report.numFailedTests} failed${skipped}`,
  );
  if (report.numPassedTests === 0) failed = true;
}
process.exit(failed ? 1 : 0);
