/**
 * The one way server/app.ts wraps every route's loader and action: a function of
 * the server build that returns the build with each handler wrapped, made once per
 * build (React Router asks for the build on every request in development).
 * Used by the 503 on a lost database, the referenced 500 and the sized JSON answers.
 */
import type { ServerBuild } from "react-router";

type RouteEntry = ServerBuild["routes"][string];
export type RouteModule = NonNullable<RouteEntry>["module"];
export type RouteHandler = NonNullable<RouteModule["loader"]>;

/** Where a handler stands: its route, loader or action, and whether the route has no page. */
export interface HandlerPlace {
  routeId: string;
  kind: "loader" | "action";
  resourceRoute: boolean;
}

export function wrapRouteHandlers(
  wrap: (handler: RouteHandler, place: HandlerPlace) => RouteHandler,
): (build: ServerBuild) => ServerBuild {
  const wrapped = new WeakMap<ServerBuild, ServerBuild>();
  return (build) => {
    const known = wrapped.get(build);
    if (known) return known;
    const routes: ServerBuild["routes"] = {};
    for (const [routeId, route] of Object.entries(build.routes)) {
      if (!route) continue;
      const resourceRoute =
        route.module.default == null && route.module.ErrorBoundary == null;
      const module: RouteModule = { ...route.module };
      if (module.loader)
        module.loader = wrap(module.loader, {
          routeId,
          kind: "loader",
          resourceRoute,
        });
      if (module.action)
        module.action = wrap(module.action, {
          routeId,
          kind: "action",
          resourceRoute,
        });
      routes[routeId] = { ...route, module };
    }
    const result: ServerBuild = { ...build, routes };
    wrapped.set(build, result);
    return result;
  };
}
