import type { Route } from "./+types/api.v1.not-found";
import { getOptionalUser } from "~/auth/guard.server";
import { apiError } from "~/lib/api.server";

/**
 * Any path under /api/v1 that no API route claims, for every method: a 404 in
 * the API's JSON error shape rather than the HTML error page. Nothing is
 * there for anyone, so no role is needed; the session is still read first, so
 * a lost database answers 503 here as everywhere.
 */
async function notFound(request: Request): Promise<Response> {
  await getOptionalUser(request);
  const { pathname } = new URL(request.url);
  return apiError(404, `No such API route: ${pathname}.`);
}

export async function loader({ request }: Route.LoaderArgs) {
  return notFound(request);
}

export async function action({ request }: Route.ActionArgs) {
  return notFound(request);
}
