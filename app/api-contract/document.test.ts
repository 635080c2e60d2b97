/**
 * The contract covers the API exactly: every method each route under api/v1 in
 * app/routes.ts serves has an operation in the document, and the document names no
 * operation the app does not serve. The methods a route serves are read from its source:
 * the list its 405 answer gives (`methodNotAllowed([...])`), else its exported loader
 * and action. The document is also checked by an outside linter (Redocly CLI) and kept
 * in step with docs/api/openapi.json, which the typed client is generated from.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import routes from "~/routes";
import { handlersOf } from "../../tests/support/route-handlers";
import { apiDocument } from "./document";
import { contractFile, contractText } from "./contract-file";

const root = path.resolve(import.meta.dirname, "..", "..");

function apiRoutes(
  entries: RouteConfigEntry[],
): { path: string; file: string }[] {
  return entries.flatMap((entry) => [
    ...(entry.path?.startsWith("api/v1/") && !entry.path.endsWith("*")
      ? [{ path: entry.path, file: entry.file }]
      : []),
    ...apiRoutes(entry.children ?? []),
  ]);
}

/** The methods a route answers other than with 405: its methodNotAllowed list, else its handlers. */
function servedMethods(file: string): string[] {
  const text = fs.readFileSync(path.join(root, "app", file), "utf8");
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const listed = new Set<string>();
  const visit = (node: ts.Node) => {
    if (
      ts.isCallExpression(node) &&
      ts.isIdentifier(node.expression) &&
      node.expression.text === "methodNotAllowed" &&
      node.arguments[0] &&
      ts.isArrayLiteralExpression(node.arguments[0])
    )
      for (const element of node.arguments[0].elements)
        if (ts.isStringLiteralLike(element)) listed.add(element.text);
    ts.forEachChild(node, visit);
  };
  visit(source);
  if (listed.size > 0) return [...listed].sort();
  return [...new Set(handlersOf(file).map((handler) => handler.method))].sort();
}

const served = apiRoutes(routes).flatMap((route) =>
  servedMethods(route.file).map(
    (method) => `${method} /${route.path.replace(/:([A-Za-z]+)/g, "{$1}")}`,
  ),
);

const documented = Object.entries(apiDocument().paths ?? {}).flatMap(
  ([pathTemplate, item]) =>
    ["get", "post", "put", "patch", "delete"]
      .filter((method) => item && method in item)
      .map((method) => `${method.toUpperCase()} ${pathTemplate}`),
);

describe("the API contract", () => {
  it("reads the served methods of every route under api/v1", () => {
    // The catalogue's items: GET and POST on the list, GET and PATCH on one.
    expect(served).toEqual(
      expect.arrayContaining([
        "GET /api/v1/items",
        "POST /api/v1/items",
        "GET /api/v1/items/{sku}",
        "PATCH /api/v1/items/{sku}",
      ]),
    );
    expect(served.length).toBeGreaterThan(60);
  });

  it("has an operation for every method a route under api/v1 serves", () => {
    expect(
      served.filter((operation) => !documented.includes(operation)),
    ).toEqual([]);
  });

  it("names no operation the app does not serve", () => {
    expect(
      documented.filter((operation) => !served.includes(operation)),
    ).toEqual([]);
  });

  it("says who may call each operation and how to authenticate", () => {
    for (const item of Object.values(apiDocument().paths ?? {}))
      for (const operation of Object.values(item ?? {})) {
        if (typeof operation !== "object" || !("responses" in operation))
          continue;
        expect(operation).toHaveProperty("x-roles");
        expect(operation.description).toMatch(/\*\*Who may call:\*\*/);
        expect(operation.responses).toHaveProperty("503");
      }
  });

  it("is the document kept in docs/api/openapi.json (npm run api:contract writes it)", () => {
    expect(fs.readFileSync(contractFile, "utf8")).toBe(contractText());
  });

  it("lints clean with Redocly CLI's recommended rules", () => {
    const file = path.join(
      fs.mkdtempSync(path.join(os.tmpdir(), "turnledger-contract-")),
      "openapi.json",
    );
    fs.writeFileSync(file, contractText());
    const run = spawnSync(
      path.join(root, "node_modules", ".bin", "redocly"),
      ["lint", file, "--config", path.join(root, "redocly.yaml")],
      {
        encoding: "utf8",
        env: {
          ...process.env,
          REDOCLY_TELEMETRY: "off",
          REDOCLY_SUPPRESS_UPDATE_NOTICE: "true",
        },
      },
    );
    // Redocly writes its findings to standard error.
    const output = `${run.stdout}${run.stderr}`;
    expect(run.status, output).toBe(0);
    expect(output).toMatch(/Your API description is valid/);
    // Its own notice about Node.js 20 aside, no finding at all: no "You have N warnings".
    expect(output).not.toMatch(/You have \d+ warnings?/);
  }, 60_000);
});
