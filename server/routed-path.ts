import type { Request as ExpressRequest } from "express";

/**
 * The path React Router will route the request by: the request's target
 * resolved as a URL (`/api/../stock` is `/stock`, `%2e%2e` and `\\` likewise),
 * exactly as @react-router/express builds its Request. Every check in front of
 * the routes judges this path, never Express's raw `request.path`, so a check
 * and the route that answers always see the same page.
 */
export function routedPath(request: ExpressRequest): string {
  let path = routedPaths.get(request);
  if (path === undefined) {
    path = resolvedPath(request);
    routedPaths.set(request, path);
  }
  return path;
}

/**
 * Each request's path, resolved once: the checks in front of the routes (the log line,
 * the host, metrics, body limits, API or page) each ask for it, and a request's target
 * never changes while it is answered.
 */
const routedPaths = new WeakMap<ExpressRequest, string>();

function resolvedPath(request: ExpressRequest): string {
  try {
    return new URL(`http://localhost${request.originalUrl}`).pathname;
  } catch {
    return request.path;
  }
}
