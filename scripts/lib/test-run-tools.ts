/**
 * Which Debian tools a test run needs, from the files Vitest will run
 * (`vitest list --filesOnly --json=…`): Chromium for the browser tests
 * (tests/e2e/), GNU units for the reference checks (the "gnu-units" project,
 * files named `*.gnu-units.test.ts`). Unit tests need neither.
 */
import path from "node:path";

export interface ListedTestFile {
  file: string;
  projectName: string;
}

export type TestTool = "chromium" | "units";

/** The vitest.config.ts project whose files check against GNU units. */
export const gnuUnitsProject = "gnu-units";

export function toolsForRun(
  files: ListedTestFile[],
  projectRoot: string,
): TestTool[] {
  const tools = new Set<TestTool>();
  for (const { file, projectName } of files) {
    const relative = path.relative(projectRoot, file).split(path.sep).join("/");
    if (projectName === "app" && relative.startsWith("tests/e2e/"))
      tools.add("chromium");
    if (projectName === gnuUnitsProject) tools.add("units");
  }
  return [...tools].sort();
}
