/**
 * Every handler the app serves, read from the source: each route file of
 * app/routes.ts, whether it exports a `loader` and an `action`, and which
 * methods the action answers. The route × role table must have a row for each.
 */
import fs from "node:fs";
import path from "node:path";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import ts from "typescript";

export type HandlerExport = "loader" | "action";
export type HandlerMethod = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

export interface RouteHandler {
  /** As app/routes.ts names it: "routes/stock.tsx". */
  file: string;
  export: HandlerExport;
  method: HandlerMethod;
}

const appFolder = path.resolve(import.meta.dirname, "..", "..", "app");

/** Methods an action can branch to besides POST, the method every action is asked with. */
const branchMethods: readonly HandlerMethod[] = ["PUT", "PATCH", "DELETE"];

/** Each route file once, in the order of app/routes.ts. */
export function routeFilesOf(entries: RouteConfigEntry[]): string[] {
  const files = entries.flatMap((entry): string[] => [
    entry.file,
    ...routeFilesOf(entry.children ?? []),
  ]);
  return [...new Set(files)];
}

function isExported(node: ts.Node): boolean {
  return (
    ts.canHaveModifiers(node) &&
    (ts.getModifiers(node) ?? []).some(
      (modifier) => modifier.kind === ts.SyntaxKind.ExportKeyword,
    )
  );
}

/** The exported loader and action of a module, each with the code that defines it. */
function exportedHandlers(source: ts.SourceFile): Map<HandlerExport, ts.Node> {
  const found = new Map<HandlerExport, ts.Node>();
  const locals = new Map<string, ts.Node>();
  const isHandler = (name: string): name is HandlerExport =>
    name === "loader" || name === "action";
  for (const statement of source.statements) {
    if (ts.isFunctionDeclaration(statement) && statement.name) {
      locals.set(statement.name.text, statement);
      if (isExported(statement) && isHandler(statement.name.text))
        found.set(statement.name.text, statement);
    }
    if (ts.isVariableStatement(statement)) {
      for (const declaration of statement.declarationList.declarations) {
        if (!ts.isIdentifier(declaration.name)) continue;
        locals.set(declaration.name.text, declaration);
        if (isExported(statement) && isHandler(declaration.name.text))
          found.set(declaration.name.text, declaration);
      }
    }
  }
  // export { handle as action }, export { loader } from "./other"
  for (const statement of source.statements) {
    if (
      !ts.isExportDeclaration(statement) ||
      !statement.exportClause ||
      !ts.isNamedExports(statement.exportClause)
    )
      continue;
    for (const element of statement.exportClause.elements) {
      if (!isHandler(element.name.text)) continue;
      const local = (element.propertyName ?? element.name).text;
      found.set(element.name.text, locals.get(local) ?? element);
    }
  }
  return found;
}

const isMethodRead = (node: ts.Node) =>
  ts.isPropertyAccessExpression(node) && node.name.text === "method";

/** The method names an action compares `request.method` with (===, !==, switch, includes). */
function comparedMethods(node: ts.Node): Set<string> {
  const methods = new Set<string>();
  const visit = (child: ts.Node) => {
    if (ts.isBinaryExpression(child)) {
      const operator = child.operatorToken.kind;
      const comparison =
        operator === ts.SyntaxKind.EqualsEqualsEqualsToken ||
        operator === ts.SyntaxKind.ExclamationEqualsEqualsToken ||
        operator === ts.SyntaxKind.EqualsEqualsToken ||
        operator === ts.SyntaxKind.ExclamationEqualsToken;
      if (comparison) {
        for (const [one, other] of [
          [child.left, child.right],
          [child.right, child.left],
        ] as const) {
          if (isMethodRead(one) && ts.isStringLiteralLike(other))
            methods.add(other.text);
        }
      }
    }
    if (ts.isSwitchStatement(child) && isMethodRead(child.expression)) {
      for (const clause of child.caseBlock.clauses) {
        if (
          ts.isCaseClause(clause) &&
          ts.isStringLiteralLike(clause.expression)
        )
          methods.add(clause.expression.text);
      }
    }
    if (
      ts.isCallExpression(child) &&
      ts.isPropertyAccessExpression(child.expression) &&
      child.expression.name.text === "includes" &&
      child.arguments.some(isMethodRead) &&
      ts.isArrayLiteralExpression(child.expression.expression)
    ) {
      for (const element of child.expression.expression.elements)
        if (ts.isStringLiteralLike(element)) methods.add(element.text);
    }
    ts.forEachChild(child, visit);
  };
  visit(node);
  return methods;
}

/** The loader (GET) and the action (POST, and each method it branches to) of one route file. */
export function handlersOf(file: string): RouteHandler[] {
  const fullPath = path.join(appFolder, file);
  const source = ts.createSourceFile(
    fullPath,
    fs.readFileSync(fullPath, "utf8"),
    ts.ScriptTarget.Latest,
    true,
    file.endsWith(".tsx") ? ts.ScriptKind.TSX : ts.ScriptKind.TS,
  );
  const handlers: RouteHandler[] = [];
  const exported = exportedHandlers(source);
  if (exported.has("loader"))
    handlers.push({ file, export: "loader", method: "GET" });
  const action = exported.get("action");
  if (action) {
    handlers.push({ file, export: "action", method: "POST" });
    const methods = comparedMethods(action);
    for (const method of branchMethods)
      if (methods.has(method))
        handlers.push({ file, export: "action", method });
  }
  return handlers;
}
