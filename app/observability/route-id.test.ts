import { describe, expect, it } from "vitest";
import {
  noRouteLabel,
  pagePathOf,
  routeIdFor,
  routeIdMatcher,
  routeTree,
} from "./route-id";

// The shape of this app's server build (app/routes.ts): a root, a signed-in
// layout with an index page and nested pages, resource routes, splats.
const tree = routeTree({
  root: { id: "root", path: "" },
  "routes/app-layout": { id: "routes/app-layout", parentId: "root" },
  "routes/home": {
    id: "routes/home",
    parentId: "routes/app-layout",
    index: true,
  },
  "routes/build-orders": {
    id: "routes/build-orders",
    parentId: "routes/app-layout",
    path: "build-orders",
  },
  "routes/build-order": {
    id: "routes/build-order",
    parentId: "routes/build-orders",
    path: ":orderId",
  },
  "routes/set-password": {
    id: "routes/set-password",
    parentId: "root",
    path: "set-password",
  },
  "routes/api.v1.items": {
    id: "routes/api.v1.items",
    parentId: "root",
    path: "api/v1/items",
  },
  "routes/healthz": { id: "routes/healthz", parentId: "root", path: "healthz" },
  "api-not-found": { id: "api-not-found", parentId: "root", path: "api/*" },
  "routes/not-found": { id: "routes/not-found", parentId: "root", path: "*" },
});

describe("routeIdFor", () => {
  it("names the deepest matching route, never the path's values", () => {
    expect(routeIdFor(tree, "/build-orders/42")).toBe("routes/build-order");
    expect(routeIdFor(tree, "/build-orders")).toBe("routes/build-orders");
    expect(routeIdFor(tree, "/")).toBe("routes/home");
    expect(routeIdFor(tree, "/api/v1/items")).toBe("routes/api.v1.items");
    expect(routeIdFor(tree, "/set-password")).toBe("routes/set-password");
  });

  it("maps a data request to its page's route", () => {
    expect(routeIdFor(tree, "/build-orders/42.data")).toBe(
      "routes/build-order",
    );
    expect(routeIdFor(tree, "/_root.data")).toBe("routes/home");
    expect(pagePathOf("/stock.data")).toBe("/stock");
    expect(pagePathOf("/stock")).toBe("/stock");
  });

  it("gives unknown paths their catch-all route, or a fixed label without one", () => {
    expect(routeIdFor(tree, "/no/such/page")).toBe("routes/not-found");
    expect(routeIdFor(tree, "/api/v2/whatever")).toBe("api-not-found");
    const withoutSplat = routeTree({
      root: { id: "root", path: "" },
      "routes/healthz": {
        id: "routes/healthz",
        parentId: "root",
        path: "healthz",
      },
    });
    expect(routeIdFor(withoutSplat, "/reset/a-secret-token")).toBe(
      noRouteLabel,
    );
    expect(routeIdFor(withoutSplat, "/healthz")).toBe("routes/healthz");
  });
});

describe("routeIdMatcher", () => {
  it("answers as routeIdFor does, asked again or after forgetting", () => {
    const match = routeIdMatcher(tree, 2);
    const paths = [
      "/build-orders/42",
      "/build-orders/42",
      "/api/v1/items",
      "/no/such/page",
      "/build-orders/42",
      "/_root.data",
      "/build-orders/7.data",
    ];
    for (const path of paths) expect(match(path)).toBe(routeIdFor(tree, path));
  });
});
