/**
 * Holding the app's answers to the published contract (app/api-contract/document.ts):
 * the status must be one the operation documents, and a JSON body must match the
 * schema documented for that status, checked by Ajv (JSON Schema 2020-12, the dialect
 * of OpenAPI 3.1).
 */
import { Ajv2020, type ValidateFunction } from "ajv/dist/2020.js";
import addFormats from "ajv-formats";
import { expect } from "vitest";
import { apiDocument } from "~/api-contract/document";

type Method = "get" | "post" | "put" | "patch" | "delete";

const ajv = new Ajv2020({ strict: false, allErrors: true });
addFormats.default(ajv);
const compiled = new Map<string, ValidateFunction>();

/** The documented operation of a path template ("/api/v1/items/{sku}") and method. */
export function documentedOperation(method: string, pathTemplate: string) {
  const operation =
    apiDocument().paths?.[pathTemplate]?.[method.toLowerCase() as Method];
  if (!operation)
    throw new Error(
      `The contract has no ${method.toUpperCase()} ${pathTemplate}.`,
    );
  return operation;
}

function validatorFor(
  method: string,
  pathTemplate: string,
  status: number,
): ValidateFunction | null {
  const key = `${method} ${pathTemplate} ${status}`;
  const known = compiled.get(key);
  if (known) return known;
  const operation = documentedOperation(method, pathTemplate);
  const answer = operation.responses?.[String(status)];
  if (!answer || "$ref" in answer) return null;
  const schema = answer.content?.["application/json"]?.schema;
  if (!schema) return null;
  const validate = ajv.compile({
    ...schema,
    // "#/components/schemas/…" references resolve inside this wrapper.
    components: { schemas: apiDocument().components?.schemas ?? {} },
  });
  compiled.set(key, validate);
  return validate;
}

/** What is wrong with an answer against the contract; empty when it conforms. */
export function contractProblems(
  method: string,
  pathTemplate: string,
  status: number,
  contentType: string | null,
  body: unknown,
): string[] {
  const where = `${method.toUpperCase()} ${pathTemplate} → ${status}`;
  const operation = documentedOperation(method, pathTemplate);
  const answer = operation.responses?.[String(status)];
  if (!answer) return [`${where}: status not in the contract`];
  if ("$ref" in answer) return [];
  const documentedTypes = Object.keys(answer.content ?? {});
  if (documentedTypes.length === 0) return [];
  const type = (contentType ?? "").split(";")[0]!.trim();
  if (!documentedTypes.includes(type))
    return [
      `${where}: content type ${type || "(none)"}, contract has ${documentedTypes.join(", ")}`,
    ];
  if (type !== "application/json") return [];
  const validate = validatorFor(method, pathTemplate, status);
  if (!validate || validate(body)) return [];
  return (validate.errors ?? []).map(
    (error) =>
      `${where}: body${error.instancePath} ${error.message} ${JSON.stringify(error.params)}`,
  );
}

/**
 * Expects `response` (not yet read) to conform to the contract's `method pathTemplate`;
 * returns its body (parsed JSON, or text for other types) for further checks.
 */
export async function expectConforming(
  response: Response,
  method: string,
  pathTemplate: string,
): Promise<unknown> {
  const contentType = response.headers.get("Content-Type");
  const text = await response.text();
  const body = contentType?.includes("json") && text ? JSON.parse(text) : text;
  expect(
    contractProblems(method, pathTemplate, response.status, contentType, body),
  ).toEqual([]);
  return body;
}
