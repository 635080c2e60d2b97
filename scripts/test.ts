/**
 * npm test: makes sure the Debian tools the chosen tests use are there
 * (Chromium when a browser test runs, GNU units when a file of the "gnu-units"
 * project runs; installed as root when missing; unit tests need neither), then
 * runs the tests with Vitest: unit, integration against the private MariaDB,
 * and browser tests. The database, mail fake and app server are started by
 * Vitest's global setup. Ends with one line "Tests: N passed, N failed".
 */
import fs from "node:fs";
import path from "node:path";
import { dataRoot, projectRoot } from "./lib/project-paths";
import {
  installDebianPackages,
  runCommand,
  runCommandQuietly,
} from "./lib/run-command";
import {
  toolsForRun,
  type ListedTestFile,
  type TestTool,
} from "./lib/test-run-tools";

const vitest = path.join(projectRoot, "node_modules", ".bin", "vitest");
const vitestArguments = process.argv.slice(2);

fs.mkdirSync(dataRoot, { recursive: true });

/**
 * The tools the files of this run need (Vitest's own choice of files from the
 * arguments); both when Vitest cannot list them, so the run then fails in
 * Vitest with its own message rather than for a missing tool.
 */
async function toolsNeeded(): Promise<TestTool[]> {
  const listFile = path.join(dataRoot, "vitest-files.json");
  fs.rmSync(listFile, { force: true });
  try {
    await runCommandQuietly(
      vitest,
      ["list", "--filesOnly", `--json=${listFile}`, ...vitestArguments],
      { cwd: projectRoot },
    );
    const files = JSON.parse(
      fs.readFileSync(listFile, "utf8"),
    ) as ListedTestFile[];
    return toolsForRun(files, projectRoot);
  } catch {
    return ["chromium", "units"];
  }
}

const toolPaths = {
  chromium: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  // GNU units is the independent reference for the AWG formula (wiregauge(n)).
  units: "/usr/bin/units",
};
const missing = (await toolsNeeded()).filter(
  (tool) => !fs.existsSync(toolPaths[tool]),
);
if (missing.length > 0) {
  await installDebianPackages(
    missing,
    `These tests need ${missing.join(" and ")} (browser tests, reference checks).`,
  );
}

fs.mkdirSync(dataRoot, { recursive: true });
const reportFile = path.join(dataRoot, "vitest-report.json");
fs.rmSync(reportFile, { force: true });

let failed = false;
try {
  await runCommand(
    vitest,
    [
      "run",
      "--reporter=default",
      "--reporter=json",
      `--outputFile.json=${reportFile}`,
      ...vitestArguments,
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
