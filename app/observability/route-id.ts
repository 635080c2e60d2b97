/**
 * Which route answered a request, by React Router's route id
 * ("routes/build-order"), for log lines and metric labels: never the raw
 * URL, whose path and query can carry tokens, e-mail addresses and ids.
 * The same matcher React Router routes with (`matchRoutes`) over the server
 * build's flat route manifest.
 */
import { matchRoutes, type RouteObject } from "react-router";

/** The part of a server build's route entry that routing reads. */
export interface ManifestRoute {
  id: string;
  parentId?: string;
  path?: string;
  index?: boolean;
  caseSensitive?: boolean;
}

/** The label of a request no route matched. */
export const noRouteLabel = "(no route)";

/** The manifest's routes as the nested tree `matchRoutes` takes. */
export function routeTree(
  manifest: Record<string, ManifestRoute | undefined>,
): RouteObject[] {
  const entries = Object.values(manifest).filter(
    (route): route is ManifestRoute => route !== undefined,
  );
  const childrenOf = (parentId: string | undefined): RouteObject[] =>
    entries
      .filter((route) => route.parentId === parentId)
      .map((route) =>
        route.index
          ? { id: route.id, index: true, path: route.path }
          : {
              id: route.id,
              path: route.path,
              caseSensitive: route.caseSensitive,
              children: childrenOf(route.id),
            },
      );
  return childrenOf(undefined);
}

/**
 * The page a single-fetch data request (`/stock.data`, `/_root.data` for
 * `/`) loads: its route is the page's.
 */
export function pagePathOf(pathname: string): string {
  if (pathname === "/_root.data") return "/";
  return pathname.endsWith(".data")
    ? pathname.slice(0, -".data".length)
    : pathname;
}

/** The id of the deepest route matching `pathname`, or {@link noRouteLabel}. */
export function routeIdFor(tree: RouteObject[], pathname: string): string {
  const matches = matchRoutes(tree, pagePathOf(pathname));
  return matches?.at(-1)?.route.id ?? noRouteLabel;
}

/** `routeIdFor` over one tree, remembering the answers for the latest paths asked. */
export type RouteIdMatcher = (pathname: string) => string;

/**
 * `matchRoutes` flattens and ranks the whole tree on every call: a matcher keeps the
 * route ids of the last `remembered` paths (a request's path is asked once per answer,
 * and under load the same paths come again), forgetting the oldest first.
 */
export function routeIdMatcher(
  tree: RouteObject[],
  remembered = 1_000,
): RouteIdMatcher {
  const known = new Map<string, string>();
  return (pathname) => {
    const found = known.get(pathname);
    if (found !== undefined) return found;
    const id = routeIdFor(tree, pathname);
    if (known.size >= remembered)
      known.delete(known.keys().next().value as string);
    known.set(pathname, id);
    return id;
  };
}
