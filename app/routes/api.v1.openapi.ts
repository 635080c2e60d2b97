import type { Route } from "./+types/api.v1.openapi";
import { apiDocument } from "~/api-contract/document";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";

/** GET /api/v1/openapi.json: the API's contract (OpenAPI 3.1), for any signed-in person. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return Response.json(apiDocument());
}

export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
