import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";
import { projectRoot } from "../lib/project-paths";
import { domainLayers, knownExceptions } from "./domain-layers.js";

const eslint = new ESLint({ cwd: projectRoot });

/** The layering rule's messages for `code` as if it were the file `filePath`. */
async function layerErrors(filePath: string, code: string) {
  const [result] = await eslint.lintText(code, { filePath });
  return result!.messages
    .filter(
      (message) =>
        message.ruleId === "@typescript-eslint/no-restricted-imports",
    )
    .map((message) => message.message);
}

// The first lint loads the whole configuration (typescript-eslint): seconds on a busy machine.
describe("the domain layering rule", { timeout: 60_000 }, () => {
  it("refuses an import of a folder above", async () => {
    const errors = await layerErrors(
      "app/stock/probe.ts",
      'import { buildOrderReference } from "~/build-orders/build-order-status";\nexport const reference = buildOrderReference(1);\n',
    );
    expect(errors).toHaveLength(1);
    expect(errors[0]).toContain("app/stock sits below");
  });

  it("refuses a type-only import of a folder above too", async () => {
    const errors = await layerErrors(
      "app/stock/probe.ts",
      'import type { MoneyAmount } from "~/pricing/money";\nexport type Amount = MoneyAmount;\n',
    );
    expect(errors).toHaveLength(1);
  });

  it("keeps app/lib free of every domain", async () => {
    const errors = await layerErrors(
      "app/lib/probe.ts",
      'import { money } from "~/pricing/money";\nexport const m = money;\n',
    );
    expect(errors).toHaveLength(1);
  });

  it("lets a folder import the folders below it and its own", async () => {
    const errors = await layerErrors(
      "app/build-orders/probe.ts",
      [
        'import { a } from "~/stock/stock-csv";',
        'import { b } from "~/lib/decimal-amounts";',
        'import { c } from "~/designs/design-costing";',
        'import { d } from "./build-order-status";',
        "export const all = [a, b, c, d];",
        "",
      ].join("\n"),
    );
    expect(errors).toEqual([]);
  });

  it("lets a known exception import only what it is excepted for", async () => {
    const exception = knownExceptions.find(
      (entry) => entry.file === "app/stock/movement-request.ts",
    )!;
    expect(exception.imports).toEqual(["build-orders"]);
    expect(
      await layerErrors(
        exception.file,
        'import { a } from "~/build-orders/build-order-status";\nexport const b = a;\n',
      ),
    ).toEqual([]);
    expect(
      await layerErrors(
        exception.file,
        'import { a } from "~/alerts/low-stock";\nexport const b = a;\n',
      ),
    ).toHaveLength(1);
  });

  it("names every domain folder of app/ once", async () => {
    const { readdirSync, statSync } = await import("node:fs");
    const { join } = await import("node:path");
    const folders = readdirSync(join(projectRoot, "app")).filter((name) =>
      statSync(join(projectRoot, "app", name)).isDirectory(),
    );
    const layered = domainLayers.flat();
    expect(new Set(layered).size).toBe(layered.length);
    // Every folder but those not yet placed is in the table.
    expect(folders.filter((name) => !layered.includes(name)).sort()).toEqual(
      [],
    );
  });
});
