/**
 * Every route handler, for anonymous callers, each role, people with two roles
 * and (under /api/) personal API tokens: the status the server answers.
 * Which handlers there are is read from the source (each file of
 * app/routes.ts, its exported loader and action, and the methods the action
 * branches to), so a route, export or method added without a row here fails
 * the first test and nothing ships without its access being checked. A row whose
 * route checks a capability takes who passes from app/lib/capabilities.ts
 * (byCapability), the table the guard and the pages read.
 */
import { createHash, randomBytes } from "node:crypto";
import { matchRoutes, type RouteObject } from "react-router";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import routes from "~/routes";
import { roles } from "~/lib/roles";
import { baseUrl, newPerson, signIn, uniqueEmail } from "../support/app-client";
import { handlersOf, routeFilesOf } from "../support/route-handlers";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

import { buildOrderRouteRows } from "./route-roles.build-orders";
import { buyingPlanRouteRows } from "./route-roles.buying-plan";
import { designRouteRows } from "./route-roles.designs";
import { insightRouteRows } from "./route-roles.insight";
import { purchaseOrderRouteRows } from "./route-roles.purchase-orders";
import { purchaseOrderPageRows } from "./route-roles.purchase-order-pages";
import { receivingRouteRows } from "./route-roles.receiving";
import { supplierRouteRows } from "./route-roles.suppliers";
import { onOrderRouteRows } from "./route-roles.on-order";
import { lotRouteRows } from "./route-roles.lots";
import { lotHoldRouteRows } from "./route-roles.lot-holds";
import { stocktakeRouteRows } from "./route-roles.stocktakes";
import { labelRouteRows } from "./route-roles.labels";
import { exportRouteRows } from "./route-roles.exports";
import {
  byCapability,
  expectedStatus,
  rolePairs,
  rolesOf,
  type Caller,
  type RouteRoleRow as Row,
} from "../support/route-role-row";

// Rows of the design and build-order routes live beside this file.
const table: Row[] = [
  ...designRouteRows,
  ...buildOrderRouteRows,
  ...buyingPlanRouteRows,
  ...insightRouteRows,
  ...supplierRouteRows,
  ...purchaseOrderRouteRows,
  ...purchaseOrderPageRows,
  ...receivingRouteRows,
  ...onOrderRouteRows,
  ...lotRouteRows,
  ...lotHoldRouteRows,
  ...stocktakeRouteRows,
  ...labelRouteRows,
  ...exportRouteRows,
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
    expect: { anonymous: 302, ...byCapability("draftPurchaseRequests", 404) },
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
    expect: { anonymous: 302, ...byCapability("managePeople", 200) },
  },
  // An empty invitation: refused before anything is written; admins get field messages.
  {
    file: "routes/admin-people.tsx",
    method: "POST",
    path: "/admin/people",
    expect: { anonymous: 302, ...byCapability("managePeople", 400) },
  },
  {
    file: "routes/admin-person.tsx",
    method: "GET",
    path: "/admin/people/demo-05-manager",
    expect: { anonymous: 302, ...byCapability("managePeople", 200) },
  },
  {
    file: "routes/admin-person.tsx",
    method: "POST",
    path: "/admin/people/demo-05-manager",
    expect: { anonymous: 302, ...byCapability("managePeople", 400) },
  },
  {
    file: "routes/admin-outbox.tsx",
    method: "GET",
    path: "/admin/outbox",
    expect: { anonymous: 302, ...byCapability("readOutbox", 200) },
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
  // The API reference page: anyone signed in; /api/<anything else> stays the API's JSON 404.
  {
    file: "routes/api-reference.tsx",
    method: "GET",
    path: "/api",
    expect: { anonymous: 302, signedIn: 200 },
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
  // Signing out ends the session it is sent with: each caller signs in afresh for it.
  {
    file: "routes/sign-out.tsx",
    method: "POST",
    path: "/sign-out",
    expect: { anonymous: 302, signedIn: 302 },
    endsSession: true,
  },
  {
    file: "routes/forgot-password.tsx",
    method: "GET",
    path: "/forgot-password",
    expect: { anonymous: 200, signedIn: 200 },
  },
  // An empty form: field messages, whoever sends it; nothing is sent or changed.
  {
    file: "routes/forgot-password.tsx",
    method: "POST",
    path: "/forgot-password",
    expect: { anonymous: 400, signedIn: 400 },
  },
  {
    file: "routes/set-password.tsx",
    method: "GET",
    path: "/set-password?token=none",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/set-password.tsx",
    method: "POST",
    path: "/set-password",
    expect: { anonymous: 400, signedIn: 400 },
  },
  {
    file: "routes/healthz.ts",
    method: "GET",
    path: "/healthz",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/readyz.ts",
    method: "GET",
    path: "/readyz",
    expect: { anonymous: 200, signedIn: 200 },
  },
  {
    file: "routes/api.v1.sessions.ts",
    method: "GET",
    path: "/api/v1/sessions",
    expect: { anonymous: 405, signedIn: 405 },
  },
  // Signing in without a JSON body is bad input; DELETE signs out the session it is sent with.
  {
    file: "routes/api.v1.sessions.ts",
    method: "POST",
    path: "/api/v1/sessions",
    expect: { anonymous: 400, signedIn: 400 },
  },
  {
    file: "routes/api.v1.sessions.ts",
    method: "DELETE",
    path: "/api/v1/sessions",
    expect: { anonymous: 204, signedIn: 204 },
    endsSession: true,
  },
  // Read-only API paths answer other methods 405, after the same check as their GET.
  {
    file: "routes/api.v1.me.ts",
    method: "POST",
    path: "/api/v1/me",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.winding-factors.ts",
    method: "GET",
    path: "/api/v1/winding-factors",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.winding-factors.ts",
    method: "POST",
    path: "/api/v1/winding-factors",
    expect: { anonymous: 401, signedIn: 400 },
  },
  {
    file: "routes/api.v1.slot-fills.ts",
    method: "GET",
    path: "/api/v1/slot-fills",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.slot-fills.ts",
    method: "POST",
    path: "/api/v1/slot-fills",
    expect: { anonymous: 401, signedIn: 400 },
  },
  {
    file: "routes/api.v1.wire-sizes.ts",
    method: "POST",
    path: "/api/v1/wire-sizes",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.magnet-grades.ts",
    method: "POST",
    path: "/api/v1/magnet-grades",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.locations.ts",
    method: "POST",
    path: "/api/v1/locations",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.alerts.ts",
    method: "POST",
    path: "/api/v1/alerts",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.item-prices.ts",
    method: "POST",
    path: "/api/v1/items/NO-SUCH-SKU/prices",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.outbox.ts",
    method: "POST",
    path: "/api/v1/outbox",
    expect: { anonymous: 401, ...byCapability("readOutbox", 405) },
  },
  {
    file: "routes/api.v1.openapi.ts",
    method: "GET",
    path: "/api/v1/openapi.json",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.openapi.ts",
    method: "POST",
    path: "/api/v1/openapi.json",
    expect: { anonymous: 401, signedIn: 405 },
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
    expect: { anonymous: 401, ...byCapability("readOutbox", 200) },
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
    method: "GET",
    path: "/api/v1/magnet-estimates",
    expect: { anonymous: 401, signedIn: 405 },
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
    expect: { anonymous: 302, ...byCapability("addMagnetGrades", 400) },
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
    expect: { anonymous: 302, ...byCapability("keepCatalogue", 200) },
  },
  {
    file: "routes/stock-item-new.tsx",
    method: "POST",
    path: "/stock/items/new",
    expect: { anonymous: 302, ...byCapability("keepCatalogue", 400) },
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
    expect: { anonymous: 302, ...byCapability("keepReorderLevels", 404) },
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
    expect: { anonymous: 302, ...byCapability("recordStock", 200) },
  },
  {
    file: "routes/stock-record.tsx",
    method: "POST",
    path: "/stock/record",
    expect: { anonymous: 302, ...byCapability("recordStock", 400) },
  },
  {
    file: "routes/stock-journal.tsx",
    method: "GET",
    path: "/stock/journal",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/stock-journal-export.ts",
    method: "GET",
    path: "/stock/journal.csv",
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
    expect: { anonymous: 401, ...byCapability("keepCatalogue", 400) },
  },
  {
    file: "routes/api.v1.item.ts",
    method: "GET",
    path: "/api/v1/items/NO-SUCH-SKU",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.item.ts",
    method: "POST",
    path: "/api/v1/items/NO-SUCH-SKU",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.item.ts",
    method: "PATCH",
    path: "/api/v1/items/NO-SUCH-SKU",
    expect: { anonymous: 401, ...byCapability("keepReorderLevels", 400) },
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
    expect: { anonymous: 401, ...byCapability("recordStock", 400) },
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
    expect: { anonymous: 401, ...byCapability("keepSuppliers", 400) },
  },
  {
    file: "routes/api.v1.price-lists.ts",
    method: "GET",
    path: "/api/v1/price-lists",
    expect: { anonymous: 401, ...byCapability("importPriceLists", 405) },
  },
  {
    file: "routes/api.v1.price-lists.ts",
    method: "POST",
    path: "/api/v1/price-lists",
    expect: { anonymous: 401, ...byCapability("importPriceLists", 400) },
  },
  {
    // A file's header and a workbook's sheets, for the mapping screen: the same guard.
    file: "routes/api.v1.price-lists.ts",
    method: "POST",
    path: "/api/v1/price-lists?layout=1",
    expect: { anonymous: 401, ...byCapability("importPriceLists", 400) },
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
    expect: { anonymous: 302, ...byCapability("importPriceLists", 200) },
  },
  // The import page works in the browser; a plain form post is refused (405) after the role check.
  {
    file: "routes/price-import.tsx",
    method: "POST",
    path: "/suppliers/import",
    expect: { anonymous: 302, ...byCapability("importPriceLists", 405) },
  },
  {
    file: "routes/api.v1.metal-base.ts",
    method: "GET",
    path: "/api/v1/metal-base",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.metal-base.ts",
    method: "POST",
    path: "/api/v1/metal-base",
    expect: { anonymous: 401, ...byCapability("keepPrices", 405) },
  },
  {
    file: "routes/api.v1.metal-base.ts",
    method: "PUT",
    path: "/api/v1/metal-base",
    expect: { anonymous: 401, ...byCapability("keepPrices", 400) },
  },
  {
    file: "routes/api.v1.currency-rates.ts",
    method: "GET",
    path: "/api/v1/currency-rates",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.currency-rates.ts",
    method: "POST",
    path: "/api/v1/currency-rates",
    expect: { anonymous: 401, ...byCapability("keepPrices", 405) },
  },
  {
    file: "routes/api.v1.currency-rates.ts",
    method: "PUT",
    path: "/api/v1/currency-rates",
    expect: { anonymous: 401, ...byCapability("keepPrices", 400) },
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
    expect: { anonymous: 302, ...byCapability("keepSuppliers", 400) },
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
    expect: { anonymous: 302, ...byCapability("keepPrices", 400) },
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
    file: "routes/not-found.tsx",
    method: "POST",
    path: "/no-such-page",
    expect: { anonymous: 404, signedIn: 404 },
  },
  // Unknown API paths: a JSON 404 for everyone, whatever the method.
  {
    file: "routes/api.v1.not-found.ts",
    method: "GET",
    path: "/api/v1/no-such-route",
    expect: { anonymous: 404, signedIn: 404 },
  },
  {
    file: "routes/api.v1.not-found.ts",
    method: "POST",
    path: "/api/v1/no-such-route",
    expect: { anonymous: 404, signedIn: 404 },
  },
];

const handlers = routeFilesOf(routes).flatMap(handlersOf);

/** The route config as React Router matches it, each route known by its file. */
function routeObjects(entries: RouteConfigEntry[]): RouteObject[] {
  return entries.map((entry) =>
    entry.index
      ? { index: true, path: entry.path, id: entry.file }
      : {
          path: entry.path,
          id: entry.file,
          children: routeObjects(entry.children ?? []),
        },
  );
}
const routeTree = routeObjects(routes);

/** The callers every row is asked as: signed out, each role, each pair of roles. */
const callers: Caller[] = ["anonymous", ...roles, ...rolePairs];
const pairPassword = "route-role-pair-password";

interface Person {
  email: string;
  password: string;
  cookie: string;
  token: string;
}
const people = new Map<Exclude<Caller, "anonymous">, Person>();

/** A personal API token of the person, following their roles, as the account page makes it. */
async function createApiToken(email: string): Promise<string> {
  const token = `tl_${randomBytes(32).toString("base64url")}`;
  await testDatabase().query(
    `INSERT INTO api_tokens (user_id, name, token_hash, token_prefix, roles, created_at, expires_at)
     SELECT id, 'route × role table', ?, ?, '*', UTC_TIMESTAMP(3), UTC_TIMESTAMP() + INTERVAL 1 DAY
     FROM users WHERE email = ?`,
    [
      createHash("sha256").update(token).digest("hex"),
      token.slice(0, 10),
      email,
    ],
  );
  return token;
}

async function addPerson(
  caller: Exclude<Caller, "anonymous">,
  email: string,
  password: string,
) {
  people.set(caller, {
    email,
    password,
    cookie: await signIn(email, password),
    token: await createApiToken(email),
  });
}

beforeAll(async () => {
  for (const role of roles) {
    const person = await newPerson(role);
    await addPerson(role, person.email, person.password);
  }
  for (const pair of rolePairs) {
    const email = uniqueEmail(pair.replace("+", "-"));
    await createPerson({
      email,
      password: pairPassword,
      roles: rolesOf(pair),
      name: `Holds ${pair}`,
    });
    await addPerson(pair, email, pairPassword);
  }
});
afterAll(closeTestDatabase);

interface Credentials {
  cookie?: string;
  token?: string;
}

/** Asks a row's request as a browser (session cookie, same-origin form post) or a script (bearer token). */
async function statusOf(row: Row, { cookie, token }: Credentials) {
  const sendsBody = row.method !== "GET";
  const response = await fetch(`${baseUrl()}${row.path}`, {
    method: row.method,
    redirect: "manual",
    headers: {
      ...(cookie ? { Cookie: cookie } : {}),
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
      ...(sendsBody
        ? { "Content-Type": "application/x-www-form-urlencoded" }
        : {}),
      ...(sendsBody && !token ? { Origin: baseUrl() } : {}),
    },
    body: sendsBody ? "" : undefined,
  });
  await response.arrayBuffer();
  return response.status;
}

/** The credentials of each caller for a row: a fresh session when the row ends it. */
async function credentialsFor(row: Row): Promise<[string, Credentials][]> {
  const asked: [string, Credentials][] = [];
  for (const caller of callers) {
    if (caller === "anonymous") {
      asked.push([caller, {}]);
      continue;
    }
    const person = people.get(caller)!;
    const cookie = row.endsSession
      ? await signIn(person.email, person.password)
      : person.cookie;
    asked.push([caller, { cookie }]);
    if (row.path.startsWith("/api/"))
      asked.push([`${caller} (token)`, { token: person.token }]);
  }
  return asked;
}

describe("route × role table", () => {
  it("has a row for every route file × exported loader or action × method", () => {
    const missing = handlers
      .filter(
        (handler) =>
          !table.some(
            (row) => row.file === handler.file && row.method === handler.method,
          ),
      )
      .map((handler) => `${handler.file} ${handler.export} ${handler.method}`);
    expect(missing).toEqual([]);
  });

  it("has no row for a handler the route file does not export", () => {
    const known = new Set(
      handlers.map((handler) => `${handler.file} ${handler.method}`),
    );
    const stale = table
      .filter((row) => !known.has(`${row.file} ${row.method}`))
      .map((row) => `${row.file} ${row.method} ${row.path}`);
    expect(stale).toEqual([]);
  });

  it("asks each row's path of the route file it names", () => {
    const elsewhere = table
      .filter((row) => {
        const pathname = new URL(row.path, "http://localhost").pathname;
        const matched = (matchRoutes(routeTree, pathname) ?? []).map(
          (match) => match.route.id,
        );
        return !matched.includes(row.file);
      })
      .map((row) => `${row.file} ${row.method} ${row.path}`);
    expect(elsewhere).toEqual([]);
  });

  for (const row of table) {
    it(`${row.method} ${row.path}`, async () => {
      const asked = await credentialsFor(row);
      const actual: Record<string, number> = {};
      const wanted: Record<string, number> = {};
      await Promise.all(
        asked.map(async ([who, credentials]) => {
          actual[who] = await statusOf(row, credentials);
          wanted[who] = expectedStatus(
            row,
            who.replace(" (token)", "") as Caller,
          );
        }),
      );
      expect(actual).toEqual(wanted);
    });
  }
});
