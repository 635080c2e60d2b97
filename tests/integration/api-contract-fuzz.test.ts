/**
 * Property-based requests to every operation of the contract, as every role and as nobody,
 * against an app server of its own on a database of its own, migrated and seeded with the
 * demo data like the shared one (so the writes drawn here never disturb other test files;
 * docs/decisions/046). fast-check draws each request from the
 * document's own schemas (tests/support/schema-arbitraries.ts): half keep to the schema so
 * they reach the route's work, half break it. Each answer must be no 5xx, a status the
 * operation documents, and a body matching the schema documented for that status (Ajv).
 * Writes refused for a role (401, 403) must change nothing: every table's checksum is the
 * same before and after them, but for the tables that record access itself (sessions,
 * tokens' last use, sign-in counters, the mail queue).
 *
 * The run is bounded: a fixed seed and a fixed number of examples per operation and
 * caller (TURNLEDGER_FUZZ_EXAMPLES, 6 by default). Its counts and every failure are
 * written to .data/api-fuzz-report.json beside the other test reports.
 */
import { createHash, randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import fc from "fast-check";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiDocument } from "~/api-contract/document";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { roles, type Role } from "~/lib/roles";
import {
  migrateDatabase,
  seedWhenEmpty,
} from "../../scripts/lib/database-tasks";
import { startMailFake, type MailFake } from "../../scripts/lib/mail-fake";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import { contractProblems } from "../support/api-contract";
import { faultPorts } from "../support/fault-environment";
import {
  breakingValue,
  validValue,
  type RefResolver,
} from "../support/schema-arbitraries";
import { dropDatabase, freshDatabase } from "../support/scratch-databases";
import { createPerson } from "../support/test-database";

const examplesPerCaller = Number(process.env.TURNLEDGER_FUZZ_EXAMPLES ?? 6);
const seed = 20261203;
const methods = ["get", "post", "put", "patch", "delete"] as const;
type Caller = "anonymous" | Role;

/** Tables that record access rather than data: a refused request may touch them. */
const accessTables = new Set([
  "sessions",
  "api_tokens",
  "attempt_counters",
  "mail_outbox",
  "mail_attachments",
  "__drizzle_migrations",
  "turnledger_migration_lock",
]);

interface Operation {
  method: (typeof methods)[number];
  pathTemplate: string;
  roles: Role[];
  open: boolean;
  parameters: {
    name: string;
    in: string;
    required?: boolean;
    schema?: Record<string, unknown>;
    example?: unknown;
  }[];
  jsonBody?: Record<string, unknown>;
}

const document = apiDocument();
const resolve: RefResolver = (ref) => {
  const name = ref.replace("#/components/schemas/", "");
  return (document.components?.schemas?.[name] ?? {}) as Record<
    string,
    unknown
  >;
};

const operations: Operation[] = Object.entries(document.paths ?? {}).flatMap(
  ([pathTemplate, item]) =>
    methods
      .filter((method) => item?.[method])
      .map((method) => {
        const operation = item![method]! as Record<string, unknown> & {
          parameters?: Operation["parameters"];
          requestBody?: {
            content?: Record<string, { schema?: Record<string, unknown> }>;
          };
        };
        return {
          method,
          pathTemplate,
          roles: (operation["x-roles"] as Role[] | undefined) ?? [],
          open:
            Array.isArray(operation.security) &&
            operation.security.length === 0,
          parameters: operation.parameters ?? [],
          jsonBody:
            operation.requestBody?.content?.["application/json"]?.schema,
        };
      }),
);

interface DrawnRequest {
  path: string;
  body: unknown;
}

/** Requests for one operation: path and query from their schemas (or their demo examples), a body kept or broken. */
function requests(
  operation: Operation,
  count: number,
  salt: number,
): DrawnRequest[] {
  const pathValues: Record<string, fc.Arbitrary<unknown>> = {};
  const queryValues: Record<string, fc.Arbitrary<unknown>> = {};
  const requiredQuery: string[] = [];
  for (const parameter of operation.parameters) {
    const fromSchema = validValue(
      parameter.schema ?? { type: "string" },
      resolve,
    );
    const example = parameter.example ?? parameter.schema?.example;
    const value =
      example === undefined
        ? fromSchema
        : fc.oneof(fc.constant(example), fromSchema);
    // A path segment is never empty, "." or "..": those address another route altogether.
    if (parameter.in === "path")
      pathValues[parameter.name] = value.filter(
        (segment) => !["", ".", ".."].includes(String(segment)),
      );
    if (parameter.in === "query") {
      queryValues[parameter.name] = value;
      if (parameter.required) requiredQuery.push(parameter.name);
    }
  }
  const body = operation.jsonBody
    ? fc.oneof(
        validValue(operation.jsonBody, resolve),
        breakingValue(operation.jsonBody, resolve),
      )
    : fc.constant(undefined);
  const drawn = fc.record({
    path: fc.record(pathValues),
    query: fc.record(queryValues, { requiredKeys: requiredQuery }),
    body,
  });
  return fc
    .sample(drawn, { seed: seed + salt, numRuns: count })
    .map((sample) => {
      const address = operation.pathTemplate.replace(
        /\{(\w+)\}/g,
        (_, name: string) =>
          encodeURIComponent(
            String((sample.path as Record<string, unknown>)[name] ?? "x"),
          ),
      );
      const query = new URLSearchParams();
      for (const [name, value] of Object.entries(
        sample.query as Record<string, unknown>,
      ))
        if (value !== undefined) query.set(name, String(value));
      const search = query.size > 0 ? `?${query}` : "";
      return { path: `${address}${search}`, body: sample.body };
    });
}

const tokens = new Map<Role, string>();
const report = {
  seed,
  examplesPerCaller,
  operations: operations.length,
  requests: 0,
  byStatus: {} as Record<string, number>,
  refusedWrites: 0,
  failures: [] as string[],
};

async function send(
  operation: Operation,
  caller: Caller,
  request: DrawnRequest,
) {
  const headers: Record<string, string> = {};
  if (caller !== "anonymous") headers.Authorization = tokens.get(caller)!;
  if (request.body !== undefined) headers["Content-Type"] = "application/json";
  const response = await fetch(`${app.baseUrl}${request.path}`, {
    method: operation.method.toUpperCase(),
    redirect: "manual",
    headers,
    body: request.body === undefined ? undefined : JSON.stringify(request.body),
  });
  const contentType = response.headers.get("Content-Type");
  const text = await response.text();
  let body: unknown = text;
  if (contentType?.includes("json") && text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = text;
    }
  }
  report.requests += 1;
  report.byStatus[response.status] =
    (report.byStatus[response.status] ?? 0) + 1;
  const where = `${operation.method.toUpperCase()} ${request.path} as ${caller}`;
  const problems =
    response.status >= 500
      ? [`${where}: ${response.status} ${text.slice(0, 200)}`]
      : contractProblems(
          operation.method,
          operation.pathTemplate,
          response.status,
          contentType,
          body,
        ).map(
          (problem) =>
            `${problem} (${where}, body ${JSON.stringify(request.body)?.slice(0, 200)})`,
        );
  report.failures.push(...problems);
  return response.status;
}

async function checksums(): Promise<Record<string, string>> {
  const [tables] = (await pool.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE'",
  )) as unknown as [{ name: string }[]];
  const names = tables
    .map((table) => table.name)
    .filter((name) => !accessTables.has(name));
  const [rows] = (await pool.query(
    `CHECKSUM TABLE ${names.map((name) => `\`${name}\``).join(", ")}`,
  )) as unknown as [{ Table: string; Checksum: string | number | null }[]];
  return Object.fromEntries(
    rows.map((row) => [row.Table, String(row.Checksum)]),
  );
}

let app: AppServer;
let mailFake: MailFake;
let pool: mysql.Pool;
let databaseName = "";

/** A person of `role` in the fuzz database and a token of theirs: the Authorization header. */
async function bearerToken(role: Role): Promise<string> {
  const userId = await createPerson(
    {
      email: `fuzz-${role}-${randomBytes(4).toString("hex")}@example.test`,
      password: randomBytes(12).toString("base64url"),
      roles: [role],
      name: `Fuzz ${role}`,
    },
    pool,
  );
  const token = `tl_${randomBytes(32).toString("base64url")}`;
  // Stored as app/auth/api-tokens.server.ts stores one: its SHA-256, following the owner's roles.
  await pool.query(
    "INSERT INTO api_tokens (user_id, name, token_hash, token_prefix, roles, created_at) VALUES (?, ?, ?, ?, '*', NOW())",
    [
      userId,
      `Fuzz ${role}`,
      createHash("sha256").update(token).digest("hex"),
      token.slice(0, 10),
    ],
  );
  return `Bearer ${token}`;
}

beforeAll(async () => {
  const database = await freshDatabase("fuzz");
  databaseName = database.name;
  await migrateDatabase(database.url);
  await seedWhenEmpty(database.url, { quiet: true });
  pool = mysql.createPool(poolOptionsFromUrl(database.url));
  // Its own mail fake: the demo buyers' alert e-mails from this app reach no other test's inbox.
  mailFake = await startMailFake({
    smtpPort: faultPorts.mailSmtp,
    httpPort: faultPorts.mailHttp,
    quiet: true,
  });
  app = await startAppServer({
    port: faultPorts.apps[3],
    databaseUrl: database.url,
    smtpUrl: `smtp://127.0.0.1:${faultPorts.mailSmtp}`,
  });
  for (const role of roles) tokens.set(role, await bearerToken(role));
}, 180_000);

afterAll(async () => {
  const file = path.resolve(
    import.meta.dirname,
    "..",
    "..",
    ".data",
    "api-fuzz-report.json",
  );
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, `${JSON.stringify(report, null, 2)}\n`);
  console.log(
    `API contract fuzz: ${report.operations} operations, ${report.requests} requests, ${report.failures.length} failures (seed ${seed}; report in .data/api-fuzz-report.json)`,
  );
  await app?.stop();
  await mailFake?.close();
  await pool?.end();
  if (databaseName) await dropDatabase(databaseName);
});

describe("every operation, drawn from the contract, as every role and as nobody", () => {
  it("covers every operation of the document", () => {
    expect(operations.length).toBeGreaterThan(60);
  });

  it("changes nothing for writes a caller may not make, and refuses them with 401 or 403", async () => {
    const before = await checksums();
    const refusals: string[] = [];
    let salt = 0;
    for (const operation of operations) {
      if (operation.open) continue;
      const write = operation.method !== "get";
      const callers: Caller[] = [
        "anonymous",
        ...roles.filter((role) => !operation.roles.includes(role)),
      ];
      for (const caller of callers) {
        salt += 1;
        if (
          !write &&
          caller !== "anonymous" &&
          operation.roles.length === roles.length
        )
          continue;
        for (const request of requests(operation, examplesPerCaller, salt)) {
          const status = await send(operation, caller, request);
          report.refusedWrites += write ? 1 : 0;
          const expected = caller === "anonymous" ? 401 : 403;
          if (status !== expected)
            refusals.push(
              `${operation.method.toUpperCase()} ${request.path} as ${caller}: ${status}, not ${expected}`,
            );
        }
      }
    }
    expect(refusals).toEqual([]);
    expect(await checksums()).toEqual(before);
  }, 600_000);

  it("answers every drawn request as the contract says, with no 5xx", async () => {
    let salt = 10_000;
    for (const operation of operations) {
      const callers: Caller[] = operation.open
        ? ["anonymous", ...roles]
        : operation.roles;
      for (const caller of callers) {
        salt += 1;
        // Signing in: few draws, so the sign-in throttle is not what answers.
        const count = operation.open ? 2 : examplesPerCaller;
        for (const request of requests(operation, count, salt))
          await send(operation, caller, request);
      }
    }
    expect(report.failures).toEqual([]);
  }, 600_000);
});
