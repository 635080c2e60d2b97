/** Route × role rows of the build-order pages and API (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

// No order has this id: once the role check passes, the answer is 404.
const noOrder = "/build-orders/999999999";

export const buildOrderRouteRows: RouteRoleRow[] = [
  // Everyone signed in reads build orders; builders (and admins) create them (an empty form gets field messages).
  {
    file: "routes/build-orders.tsx",
    method: "GET",
    path: "/build-orders",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/build-orders.tsx",
    method: "POST",
    path: "/build-orders",
    expect: { anonymous: 302, ...byCapability("createBuildOrders", 400) },
  },
  {
    file: "routes/build-orders-export.ts",
    method: "GET",
    path: "/build-orders/export.csv",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/build-order.tsx",
    method: "GET",
    path: noOrder,
    expect: { anonymous: 302, signedIn: 404 },
  },
  // Builders reserve, complete and cancel; storekeepers issue: both get past the role check.
  {
    file: "routes/build-order.tsx",
    method: "POST",
    path: noOrder,
    expect: { anonymous: 302, ...byCapability("takeBuildOrderSteps", 404) },
  },
  {
    file: "routes/api.v1.build-orders.ts",
    method: "GET",
    path: "/api/v1/build-orders",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.build-orders.ts",
    method: "POST",
    path: "/api/v1/build-orders",
    expect: { anonymous: 401, ...byCapability("createBuildOrders", 400) },
  },
  {
    file: "routes/api.v1.build-order.ts",
    method: "GET",
    path: `/api/v1${noOrder}`,
    expect: { anonymous: 401, signedIn: 404 },
  },
  // The order API takes GET and PATCH: a POST is 405 once the role check passes.
  {
    file: "routes/api.v1.build-order.ts",
    method: "POST",
    path: `/api/v1${noOrder}`,
    expect: { anonymous: 401, ...byCapability("runBuildOrders", 405) },
  },
  {
    file: "routes/api.v1.build-order.ts",
    method: "PATCH",
    path: `/api/v1${noOrder}`,
    expect: { anonymous: 401, ...byCapability("runBuildOrders", 400) },
  },
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "POST",
    path: `/api/v1${noOrder}/reserve`,
    expect: { anonymous: 401, ...byCapability("runBuildOrders", 404) },
  },
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "POST",
    path: `/api/v1${noOrder}/cancel`,
    expect: { anonymous: 401, ...byCapability("runBuildOrders", 404) },
  },
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "POST",
    path: `/api/v1${noOrder}/complete`,
    expect: { anonymous: 401, ...byCapability("runBuildOrders", 404) },
  },
  // An issue without a JSON body is refused as bad input once the role check passes.
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "POST",
    path: `/api/v1${noOrder}/issue`,
    expect: { anonymous: 401, ...byCapability("issueToBuildOrders", 400) },
  },
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "POST",
    path: `/api/v1${noOrder}/melt`,
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.build-order-step.ts",
    method: "GET",
    path: `/api/v1${noOrder}/reserve`,
    expect: { anonymous: 401, signedIn: 405 },
  },
];
