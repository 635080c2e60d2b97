/** Route × role rows of the design pages and API (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

/**
 * The table runs against the demo data, which has no design: the routes of one design are
 * asked for a design that does not exist. Signed-in readers get 404 (after the role check:
 * anonymous callers are sent to sign in, or get 401 from the API); an empty POST from a
 * builder is refused as bad input (400) before any design is looked up. The pages with a
 * real design, per role, are in design-pages.test.ts.
 */
const missing = "/designs/999999/revisions/1";

export const designRouteRows: RouteRoleRow[] = [
  {
    file: "routes/designs.tsx",
    method: "GET",
    path: "/designs",
    expect: { anonymous: 302, signedIn: 200 },
  },
  // An empty new design: field messages for builders, nothing written.
  {
    file: "routes/designs.tsx",
    method: "POST",
    path: "/designs",
    expect: { anonymous: 302, ...byCapability("editDesigns", 400) },
  },
  {
    file: "routes/design-revision.tsx",
    method: "GET",
    path: missing,
    expect: { anonymous: 302, signedIn: 404 },
  },
  // No intent: refused before the revision is looked up.
  {
    file: "routes/design-revision.tsx",
    method: "POST",
    path: missing,
    expect: { anonymous: 302, ...byCapability("editDesigns", 400) },
  },
  {
    file: "routes/design-bom-export.ts",
    method: "GET",
    path: `${missing}/bom.csv`,
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/design-bom-print.tsx",
    method: "GET",
    path: `${missing}/print`,
    expect: { anonymous: 302, signedIn: 404 },
  },

  // The API.
  {
    file: "routes/api.v1.designs.ts",
    method: "GET",
    path: "/api/v1/designs",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.designs.ts",
    method: "POST",
    path: "/api/v1/designs",
    expect: { anonymous: 401, ...byCapability("editDesigns", 400) },
  },
  {
    file: "routes/api.v1.design.ts",
    method: "GET",
    path: "/api/v1/designs/999999",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.design.ts",
    method: "POST",
    path: "/api/v1/designs/999999",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.design-revisions.ts",
    method: "GET",
    path: "/api/v1/designs/999999/revisions",
    expect: { anonymous: 401, ...byCapability("editDesigns", 405) },
  },
  {
    file: "routes/api.v1.design-revisions.ts",
    method: "POST",
    path: "/api/v1/designs/999999/revisions",
    expect: { anonymous: 401, ...byCapability("editDesigns", 404) },
  },
  {
    file: "routes/api.v1.design-revision.ts",
    method: "GET",
    path: "/api/v1/designs/999999/revisions/1",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.design-revision.ts",
    method: "PUT",
    path: "/api/v1/designs/999999/revisions/1",
    expect: { anonymous: 401, ...byCapability("editDesigns", 400) },
  },
  {
    file: "routes/api.v1.design-revision.ts",
    method: "PATCH",
    path: "/api/v1/designs/999999/revisions/1",
    expect: { anonymous: 401, ...byCapability("editDesigns", 400) },
  },
  {
    file: "routes/api.v1.design-revision.ts",
    method: "POST",
    path: "/api/v1/designs/999999/revisions/1",
    expect: { anonymous: 401, ...byCapability("editDesigns", 405) },
  },
  {
    file: "routes/api.v1.design-revision-release.ts",
    method: "GET",
    path: "/api/v1/designs/999999/revisions/1/release",
    expect: { anonymous: 401, ...byCapability("releaseDesigns", 405) },
  },
  {
    file: "routes/api.v1.design-revision-release.ts",
    method: "POST",
    path: "/api/v1/designs/999999/revisions/1/release",
    expect: { anonymous: 401, ...byCapability("releaseDesigns", 404) },
  },
  {
    file: "routes/api.v1.design-costing.ts",
    method: "GET",
    path: "/api/v1/designs/999999/revisions/1/costing",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.design-costing.ts",
    method: "POST",
    path: "/api/v1/designs/999999/revisions/1/costing",
    expect: { anonymous: 401, signedIn: 405 },
  },
  // Substitutes from stock: any reader may look; an empty POST from a builder is bad input (400).
  {
    file: "routes/api.v1.design-line-substitutes.ts",
    method: "GET",
    path: "/api/v1/designs/999999/revisions/1/lines/1/substitutes",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.design-line-substitutes.ts",
    method: "POST",
    path: "/api/v1/designs/999999/revisions/1/lines/1/substitutes",
    expect: { anonymous: 401, ...byCapability("editDesigns", 400) },
  },
];
