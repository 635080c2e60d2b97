/**
 * Every route, for anonymous and each role: the status the server answers.
 * A route added to app/routes.ts without a row here fails the first test,
 * so no route ships without its access being checked.
 */
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { beforeAll, describe, expect, it } from "vitest";
import routes from "~/routes";
import { roles, type Role } from "~/lib/roles";
import { demoPassword, demoPeople } from "../../seed/demo-people";
import { baseUrl, signIn } from "../support/app-client";

type Who = "anonymous" | Role;
const everyone: Who[] = ["anonymous", ...roles];

interface Row {
  file: string;
  method: "GET" | "POST";
  path: string;
  /** Expected status per caller; `signedIn` covers every role not named. */
  expect: Partial<Record<Who, number>> & { signedIn?: number };
}

const adminOnly = { anonymous: 302, admin: 200, signedIn: 403 };
const adminOnlyApi = { anonymous: 401, admin: 200, signedIn: 403 };

const table: Row[] = [
  { file: "routes/app-shell.tsx", method: "GET", path: "/", expect: { anonymous: 302, signedIn: 200 } },
  { file: "routes/home.tsx", method: "GET", path: "/", expect: { anonymous: 302, signedIn: 200 } },
  { file: "routes/admin-people.tsx", method: "GET", path: "/admin/people", expect: adminOnly },
  // An empty invitation: refused before anything is written; admins get field messages.
  { file: "routes/admin-people.tsx", method: "POST", path: "/admin/people", expect: { anonymous: 302, admin: 400, signedIn: 403 } },
  { file: "routes/admin-person.tsx", method: "GET", path: "/admin/people/demo-05-manager", expect: adminOnly },
  { file: "routes/admin-person.tsx", method: "POST", path: "/admin/people/demo-05-manager", expect: { anonymous: 302, admin: 400, signedIn: 403 } },
  { file: "routes/admin-outbox.tsx", method: "GET", path: "/admin/outbox", expect: adminOnly },
  { file: "routes/account.tsx", method: "GET", path: "/account", expect: { anonymous: 302, signedIn: 200 } },
  { file: "routes/account.tsx", method: "POST", path: "/account", expect: { anonymous: 302, signedIn: 400 } },
  { file: "routes/sign-in.tsx", method: "GET", path: "/sign-in", expect: { anonymous: 200, signedIn: 302 } },
  // Signed in, the page itself sends people on to the start page.
  { file: "routes/sign-in.tsx", method: "POST", path: "/sign-in", expect: { anonymous: 400, signedIn: 302 } },
  { file: "routes/sign-out.tsx", method: "GET", path: "/sign-out", expect: { anonymous: 302, signedIn: 302 } },
  { file: "routes/forgot-password.tsx", method: "GET", path: "/forgot-password", expect: { anonymous: 200, signedIn: 200 } },
  { file: "routes/set-password.tsx", method: "GET", path: "/set-password?token=none", expect: { anonymous: 200, signedIn: 200 } },
  { file: "routes/healthz.ts", method: "GET", path: "/healthz", expect: { anonymous: 200, signedIn: 200 } },
  { file: "routes/api.v1.sessions.ts", method: "GET", path: "/api/v1/sessions", expect: { anonymous: 405, signedIn: 405 } },
  { file: "routes/api.v1.me.ts", method: "GET", path: "/api/v1/me", expect: { anonymous: 401, signedIn: 200 } },
  { file: "routes/api.v1.outbox.ts", method: "GET", path: "/api/v1/outbox", expect: adminOnlyApi },
  // The engineering API: every signed-in role may calculate and read reference data.
  { file: "routes/api.v1.coil-estimates.ts", method: "GET", path: "/api/v1/coil-estimates", expect: { anonymous: 401, signedIn: 405 } },
  { file: "routes/api.v1.coil-estimates.ts", method: "POST", path: "/api/v1/coil-estimates", expect: { anonymous: 401, signedIn: 400 } },
  { file: "routes/api.v1.magnet-estimates.ts", method: "POST", path: "/api/v1/magnet-estimates", expect: { anonymous: 401, signedIn: 400 } },
  { file: "routes/api.v1.wire-sizes.ts", method: "GET", path: "/api/v1/wire-sizes?standard=IEC", expect: { anonymous: 401, signedIn: 200 } },
  { file: "routes/api.v1.magnet-grades.ts", method: "GET", path: "/api/v1/magnet-grades", expect: { anonymous: 401, signedIn: 200 } },
  { file: "routes/not-found.tsx", method: "GET", path: "/no-such-page", expect: { anonymous: 404, signedIn: 404 } },
  { file: "routes/not-found.tsx", method: "GET", path: "/api/v1/no-such-route", expect: { anonymous: 404, signedIn: 404 } },
];

function routeFiles(entries: RouteConfigEntry[]): string[] {
  return entries.flatMap((entry) => [entry.file, ...routeFiles(entry.children ?? [])]);
}

function expected(row: Row, who: Who): number {
  const status = row.expect[who] ?? (who === "anonymous" ? undefined : row.expect.signedIn);
  if (status === undefined) throw new Error(`no expectation for ${who} on ${row.method} ${row.path}`);
  return status;
}

const cookies = new Map<Who, string | undefined>();

beforeAll(async () => {
  cookies.set("anonymous", undefined);
  for (const role of roles) {
    const person = demoPeople.find((candidate) => candidate.roles.includes(role))!;
    cookies.set(role, await signIn(person.email, demoPassword()));
  }
});

describe("route × role table", () => {
  it("covers every route in app/routes.ts", () => {
    const covered = new Set(table.map((row) => row.file));
    const missing = routeFiles(routes).filter((file) => !covered.has(file));
    expect(missing).toEqual([]);
  });

  for (const row of table) {
    it(`${row.method} ${row.path}`, async () => {
      const actual: Record<string, number> = {};
      const wanted: Record<string, number> = {};
      for (const who of everyone) {
        const cookie = cookies.get(who);
        const response = await fetch(`${baseUrl()}${row.path}`, {
          method: row.method,
          redirect: "manual",
          headers: {
            ...(cookie ? { Cookie: cookie } : {}),
            ...(row.method === "POST"
              ? { "Content-Type": "application/x-www-form-urlencoded", Origin: baseUrl() }
              : {}),
          },
          body: row.method === "POST" ? "" : undefined,
        });
        await response.arrayBuffer();
        actual[who] = response.status;
        wanted[who] = expected(row, who);
      }
      expect(actual).toEqual(wanted);
    });
  }
});
