/**
 * Every route, for anonymous and each role: the status the server answers.
 * A route added to app/routes.ts without a row here fails the first test,
 * so no route ships without its access being checked.
 */
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { beforeAll, describe, expect, it } from "vitest";
import routes from "~/routes";
import { roles } from "~/lib/roles";
import { demoPassword, demoPeople } from "../../seed/demo-people";
import { baseUrl, signIn } from "../support/app-client";

import { buildOrderRouteRows } from "./route-roles.build-orders";
import { designRouteRows } from "./route-roles.designs";
import { insightRouteRows } from "./route-roles.insight";
import type { RouteRoleRow as Row, Who } from "../support/route-role-row";

const everyone: Who[] = ["anonymous", ...roles];

const adminOnly = { anonymous: 302, admin: 200, signedIn: 403 };
const adminOnlyApi = { anonymous: 401, admin: 200, signedIn: 403 };

// Rows of the design and build-order routes live beside this file.
const table: Row[] = [
  ...designRouteRows,
  ...buildOrderRouteRows,
  ...insightRouteRows,
  {
    file: "routes/alerts.tsx",
    method: "GET",
    path: "/alerts",
    expect: { anonymous: 302, signedIn: 200 },
  },
  // Buyers only; a supplier that quotes no alerted item answers 404.
  {
    file: "routes/alerts-purchase-request.ts",
    method: "GET",
    path: "/alerts/purchase-request.csv?supplier=Nobody%20at%20all",
    expect: { anonymous: 302, buyer: 404, admin: 404, signedIn: 403 },
  },
  {
    file: "routes/api.v1.alerts.ts",
    method: "GET",
    path: "/api/v1/alerts",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/app-shell.tsx",
    method: "GET",
    path: "/",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/home.tsx",
    method: "GET",
    path: "/",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/admin-people.tsx",
    method: "GET",
    path: "/admin/people",
    expect: adminOnly,
  },
  // An empty invitation: refused before anything is written; admins get field messages.
  {
    file: "routes/admin-people.tsx",
    method: "POST",
    path: "/admin/people",
    expect: { anonymous: 302, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/admin-person.tsx",
    method: "GET",
    path: "/admin/people/demo-05-manager",
    expect: adminOnly,
  },
  {
    file: "routes/admin-person.tsx",
    method: "POST",
    path: "/admin/people/demo-05-manager",
    expect: { anonymous: 302, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/admin-outbox.tsx",
    method: "GET",
    path: "/admin/outbox",
    expect: adminOnly,
  },
  {
    file: "routes/account.tsx",
    method: "GET",
    path: "/account",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/account.tsx",
    method: "POST",
    path: "/account",
    expect: { anonymous: 302, signedIn: 400 },
  },
  {
    file: "routes/sign-in.tsx",
    method: "GET",
    path: "/sign-in",
    expect: { anonymous: 200, signedIn: 302 },
  },
  // Signed in, the page itself sends people on to the start page.
  {
    file: "routes/sign-in.tsx",
    method: "POST",
    path: "/sign-in",
    expect: { anonymous: 400, signedIn: 302 },
  },
  {
    file: "routes/sign-out.tsx",
    method: "GET",
    path: "/sign-out",
    expect: { anonymous: 302, signedIn: 302 },
  },
  {
    file: "routes/forgot-password.tsx",
    method: "GET",
    path: "/forgot-password",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/set-password.tsx",
    method: "GET",
    path: "/set-password?token=none",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/healthz.ts",
    method: "GET",
    path: "/healthz",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/api.v1.sessions.ts",
    method: "GET",
    path: "/api/v1/sessions",
    expect: { anonymous: 405, signedIn: 405 },
  },
  {
    file: "routes/api.v1.me.ts",
    method: "GET",
    path: "/api/v1/me",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.outbox.ts",
    method: "GET",
    path: "/api/v1/outbox",
    expect: adminOnlyApi,
  },
  // The engineering API: every signed-in role may calculate and read reference data.
  {
    file: "routes/api.v1.coil-estimates.ts",
    method: "GET",
    path: "/api/v1/coil-estimates",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.coil-estimates.ts",
    method: "POST",
    path: "/api/v1/coil-estimates",
    expect: { anonymous: 401, signedIn: 400 },
  },
  {
    file: "routes/api.v1.magnet-estimates.ts",
    method: "POST",
    path: "/api/v1/magnet-estimates",
    expect: { anonymous: 401, signedIn: 400 },
  },
  {
    file: "routes/api.v1.wire-sizes.ts",
    method: "GET",
    path: "/api/v1/wire-sizes?standard=IEC",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.magnet-grades.ts",
    method: "GET",
    path: "/api/v1/magnet-grades",
    expect: { anonymous: 401, signedIn: 200 },
  },
  // Magnet estimator: every signed-in role; estimates come from the API in the browser, so the page takes no POST.
  {
    file: "routes/magnet-estimator.tsx",
    method: "GET",
    path: "/tools/magnet-estimator",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/magnet-estimator.tsx",
    method: "POST",
    path: "/tools/magnet-estimator",
    expect: { anonymous: 302, signedIn: 405 },
  },
  // Reference tables: every signed-in role reads; only admins add a magnet grade (an empty one gets field messages).
  {
    file: "routes/reference.tsx",
    method: "GET",
    path: "/reference",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/reference.tsx",
    method: "GET",
    path: "/reference?table=magnet-grades",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/reference.tsx",
    method: "POST",
    path: "/reference",
    expect: { anonymous: 302, admin: 400, signedIn: 403 },
  },
  // Stock pages: everyone signed in reads; buyers (and admins) add items; an unknown SKU is 404 once the role check passes.
  {
    file: "routes/stock.tsx",
    method: "GET",
    path: "/stock",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/stock-export.ts",
    method: "GET",
    path: "/stock/export.csv",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/stock-item-new.tsx",
    method: "GET",
    path: "/stock/items/new",
    expect: { anonymous: 302, admin: 200, buyer: 200, signedIn: 403 },
  },
  {
    file: "routes/stock-item-new.tsx",
    method: "POST",
    path: "/stock/items/new",
    expect: { anonymous: 302, admin: 400, buyer: 400, signedIn: 403 },
  },
  {
    file: "routes/stock-item.tsx",
    method: "GET",
    path: "/stock/items/NO-SUCH-SKU",
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/stock-item.tsx",
    method: "POST",
    path: "/stock/items/NO-SUCH-SKU",
    expect: {
      anonymous: 302,
      admin: 404,
      buyer: 404,
      storekeeper: 404,
      signedIn: 403,
    },
  },
  // The coil estimator (its live figures come from the API through a clientAction).
  {
    file: "routes/coil-estimator.tsx",
    method: "GET",
    path: "/tools/coil-estimator",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/coil-estimator.tsx",
    method: "POST",
    path: "/tools/coil-estimator",
    expect: { anonymous: 302, signedIn: 405 },
  },
  // Recording movements is the storekeeper's (and admin's); everyone reads the journal.
  {
    file: "routes/stock-record.tsx",
    method: "GET",
    path: "/stock/record",
    expect: { anonymous: 302, storekeeper: 200, admin: 200, signedIn: 403 },
  },
  {
    file: "routes/stock-record.tsx",
    method: "POST",
    path: "/stock/record",
    expect: { anonymous: 302, storekeeper: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/stock-journal.tsx",
    method: "GET",
    path: "/stock/journal",
    expect: { anonymous: 302, signedIn: 200 },
  },
  // The stock API: everyone reads; buyers create items; storekeepers record movements.
  {
    file: "routes/api.v1.items.ts",
    method: "GET",
    path: "/api/v1/items",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.items.ts",
    method: "POST",
    path: "/api/v1/items",
    expect: { anonymous: 401, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/api.v1.item.ts",
    method: "GET",
    path: "/api/v1/items/NO-SUCH-SKU",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.item.ts",
    method: "PATCH",
    path: "/api/v1/items/NO-SUCH-SKU",
    expect: {
      anonymous: 401,
      buyer: 400,
      storekeeper: 400,
      admin: 400,
      signedIn: 403,
    },
  },
  {
    file: "routes/api.v1.locations.ts",
    method: "GET",
    path: "/api/v1/locations",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.stock-movements.ts",
    method: "GET",
    path: "/api/v1/stock-movements",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.stock-movements.ts",
    method: "POST",
    path: "/api/v1/stock-movements",
    expect: { anonymous: 401, storekeeper: 400, admin: 400, signedIn: 403 },
  },
  // Suppliers and prices: everyone reads; buyers (and admins) keep them and import price lists.
  {
    file: "routes/api.v1.suppliers.ts",
    method: "GET",
    path: "/api/v1/suppliers",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.suppliers.ts",
    method: "POST",
    path: "/api/v1/suppliers",
    expect: { anonymous: 401, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/api.v1.price-lists.ts",
    method: "POST",
    path: "/api/v1/price-lists",
    expect: { anonymous: 401, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/api.v1.item-prices.ts",
    method: "GET",
    path: "/api/v1/items/NO-SUCH-SKU/prices",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/price-import.tsx",
    method: "GET",
    path: "/suppliers/import",
    expect: { anonymous: 302, buyer: 200, admin: 200, signedIn: 403 },
  },
  // The import page works in the browser; a plain form post is refused (405) after the role check.
  {
    file: "routes/price-import.tsx",
    method: "POST",
    path: "/suppliers/import",
    expect: { anonymous: 302, buyer: 405, admin: 405, signedIn: 403 },
  },
  {
    file: "routes/api.v1.metal-base.ts",
    method: "GET",
    path: "/api/v1/metal-base",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.metal-base.ts",
    method: "PUT",
    path: "/api/v1/metal-base",
    expect: { anonymous: 401, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/api.v1.currency-rates.ts",
    method: "GET",
    path: "/api/v1/currency-rates",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.currency-rates.ts",
    method: "PUT",
    path: "/api/v1/currency-rates",
    expect: { anonymous: 401, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/suppliers.tsx",
    method: "GET",
    path: "/suppliers",
    expect: { anonymous: 302, signedIn: 200 },
  },
  // An empty new supplier: refused before anything is written; buyers get field messages.
  {
    file: "routes/suppliers.tsx",
    method: "POST",
    path: "/suppliers",
    expect: { anonymous: 302, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/prices.tsx",
    method: "GET",
    path: "/prices",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/prices.tsx",
    method: "POST",
    path: "/prices",
    expect: { anonymous: 302, buyer: 400, admin: 400, signedIn: 403 },
  },
  {
    file: "routes/price-imports.tsx",
    method: "GET",
    path: "/suppliers/imports",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/not-found.tsx",
    method: "GET",
    path: "/no-such-page",
    expect: { anonymous: 404, signedIn: 404 },
  },
  {
    file: "routes/api.v1.not-found.ts",
    method: "GET",
    path: "/api/v1/no-such-route",
    expect: { anonymous: 404, signedIn: 404 },
  },
];

function routeFiles(entries: RouteConfigEntry[]): string[] {
  return entries.flatMap((entry) => [
    entry.file,
    ...routeFiles(entry.children ?? []),
  ]);
}

function expected(row: Row, who: Who): number {
  const status =
    row.expect[who] ?? (who === "anonymous" ? undefined : row.expect.signedIn);
  if (status === undefined)
    throw new Error(`no expectation for ${who} on ${row.method} ${row.path}`);
  return status;
}

const cookies = new Map<Who, string | undefined>();

beforeAll(async () => {
  cookies.set("anonymous", undefined);
  for (const role of roles) {
    const person = demoPeople.find((candidate) =>
      candidate.roles.includes(role),
    )!;
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
            ...(row.method !== "GET"
              ? {
                  "Content-Type": "application/x-www-form-urlencoded",
                  Origin: baseUrl(),
                }
              : {}),
          },
          body: row.method !== "GET" ? "" : undefined,
        });
        await response.arrayBuffer();
        actual[who] = response.status;
        wanted[who] = expected(row, who);
      }
      expect(actual).toEqual(wanted);
    });
  }
});
