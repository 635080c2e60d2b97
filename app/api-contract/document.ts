/**
 * The published contract of /api/v1: an OpenAPI 3.1 document made from the Zod schemas
 * the routes validate with (zod-openapi), served at GET /api/v1/openapi.json, rendered
 * on the /api page and written to docs/api/openapi.json (`npm run api:contract`), from
 * which the typed client's types are generated. docs/decisions/046. Pure: no I/O.
 */
import { createDocument } from "zod-openapi";
import type { oas31 } from "zod-openapi";
import { errorBodySchema } from "./operation";
import { accountPaths } from "./paths/account";
import { buildOrderPaths } from "./paths/build-orders";
import { designPaths } from "./paths/designs";
import { engineeringPaths } from "./paths/engineering";
import { itemPaths } from "./paths/items";
import { pricePaths } from "./paths/prices";
import { purchasingPaths } from "./paths/purchasing";
import { stockPaths } from "./paths/stock";

const description = `Turnledger's JSON API: the same data and rules as the pages, for a shop's own
scripts, accounting and label printers.

**Authenticating.** Either the session cookie \`turnledger_session\` (from \`POST /api/v1/sessions\`
or the sign-in page; a write with the cookie must also send the app's own \`Origin\`), or a
personal API token made on the account page, sent as \`Authorization: Bearer <token>\`. A token
acts with its person's roles. Each operation says which roles may call it (also as \`x-roles\`).

**Numbers and times** are machine-neutral whatever the person's display settings: a decimal
point, no grouping, ISO 8601 times in UTC, calendar days as \`YYYY-MM-DD\`. Money is in EUR.

**Errors** all have one shape, \`{ "error": { "message": "…", "fields": { "field": ["…"] } } }\`.
While the database is away every operation answers 503 with \`Retry-After\`.

**Versioning.** Within \`/api/v1\` changes are additions only: new operations, new optional
fields in requests, new fields in answers. Clients must ignore fields they do not know. A
breaking change (a field removed, renamed or retyped, a status changed) comes as \`/api/v2\`,
served beside v1 for at least six months.`;

let built: oas31.OpenAPIObject | undefined;

/** The document, built once per process (it depends on the code only). */
export function apiDocument(): oas31.OpenAPIObject {
  built ??= createDocument({
    openapi: "3.1.0",
    info: {
      title: "Turnledger API",
      version: "1",
      description,
    },
    servers: [{ url: "/", description: "This Turnledger server" }],
    tags: [
      {
        name: "Account",
        description: "Signing in, who you are, the contract itself.",
      },
      {
        name: "Stock",
        description: "Items, locations, lots, movements and alerts.",
      },
      {
        name: "Engineering",
        description:
          "Coil, magnet, winding and slot estimates; reference tables.",
      },
      {
        name: "Designs",
        description: "Motor designs, revisions, costing and cost insight.",
      },
      { name: "Build orders", description: "Build orders and their steps." },
      {
        name: "Purchasing",
        description:
          "Suppliers, price lists, prices, the buying plan and purchase orders.",
      },
    ],
    components: {
      securitySchemes: {
        sessionCookie: {
          type: "apiKey",
          in: "cookie",
          name: "turnledger_session",
          description:
            "The session a sign-in starts (POST /api/v1/sessions or the sign-in page).",
        },
        bearerToken: {
          type: "http",
          scheme: "bearer",
          description:
            "A personal API token from the account page: `Authorization: Bearer <token>`.",
        },
      },
      schemas: { ErrorBody: errorBodySchema },
    },
    paths: {
      ...accountPaths,
      ...itemPaths,
      ...stockPaths,
      ...engineeringPaths,
      ...designPaths,
      ...buildOrderPaths,
      ...purchasingPaths,
      ...pricePaths,
    },
  });
  return built;
}
