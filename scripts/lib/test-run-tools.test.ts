import { describe, expect, it } from "vitest";
import { toolsForRun } from "./test-run-tools";

const root = "/work/turnledger";
const listed = (file: string, projectName: string) => ({
  file: `${root}/${file}`,
  projectName,
});

describe("toolsForRun", () => {
  it("needs nothing for unit tests alone", () => {
    expect(
      toolsForRun(
        [
          listed("app/engineering/wire-geometry.test.ts", "unit"),
          listed("scripts/lib/build-inputs.test.ts", "unit"),
        ],
        root,
      ),
    ).toEqual([]);
  });

  it("needs nothing for HTTP tests alone", () => {
    expect(
      toolsForRun([listed("tests/integration/sign-in.test.ts", "app")], root),
    ).toEqual([]);
  });

  it("needs Chromium when a browser test runs", () => {
    expect(
      toolsForRun(
        [
          listed("tests/integration/sign-in.test.ts", "app"),
          listed("tests/e2e/stock-pages.test.ts", "app"),
        ],
        root,
      ),
    ).toEqual(["chromium"]);
  });

  it("needs GNU units when a file of the gnu-units project runs", () => {
    expect(
      toolsForRun(
        [listed("app/engineering/wire-gauge.gnu-units.test.ts", "gnu-units")],
        root,
      ),
    ).toEqual(["units"]);
  });

  it("needs both for the whole suite", () => {
    expect(
      toolsForRun(
        [
          listed("tests/e2e/stock-pages.test.ts", "app"),
          listed("app/engineering/wire-gauge.gnu-units.test.ts", "gnu-units"),
          listed("app/engineering/wire-geometry.test.ts", "unit"),
        ],
        root,
      ),
    ).toEqual(["chromium", "units"]);
  });
});
