/**
 * Route × role rows of lot holds (see route-roles.test.ts): storekeepers (and admins) put
 * a lot on hold and release it, through the API and the lot page's actions; everyone
 * signed in is told which method the API takes, and a GET of a page action goes to the
 * lot's page (404 for a lot that does not exist).
 * An API POST without a JSON body answers 400 after the role check, before any lot is
 * read; a page POST for a lot that does not exist answers 404 after the role check.
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const lotHoldRouteRows: RouteRoleRow[] = [
  ...(["hold", "release"] as const).flatMap((step): RouteRoleRow[] => [
    {
      file: `routes/api.v1.lot-${step}.ts`,
      method: "GET",
      path: `/api/v1/lots/NO-SUCH-LOT/${step}`,
      expect: { anonymous: 401, signedIn: 405 },
    },
    {
      file: `routes/api.v1.lot-${step}.ts`,
      method: "POST",
      path: `/api/v1/lots/NO-SUCH-LOT/${step}`,
      expect: {
        anonymous: 401,
        // hold needs a JSON body with a reason; a release's body is optional, so the lot is looked for.
        ...byCapability("holdLots", step === "hold" ? 400 : 404),
      },
    },
    {
      file: `routes/stock-lot-${step}.ts`,
      method: "GET",
      path: `/stock/lots/2147483647/${step}`,
      expect: { anonymous: 302, signedIn: 404 },
    },
    {
      file: `routes/stock-lot-${step}.ts`,
      method: "POST",
      path: `/stock/lots/2147483647/${step}`,
      expect: { anonymous: 302, ...byCapability("holdLots", 404) },
    },
  ]),
];
