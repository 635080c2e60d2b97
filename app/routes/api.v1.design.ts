import type { Route } from "./+types/api.v1.design";
import { requireUser } from "~/auth/guard.server";
import { designParams } from "~/designs/design-params";
import { listDesignRevisions } from "~/designs/designs.server";
import { apiError, methodNotAllowed } from "~/lib/api.server";

/** GET /api/v1/designs/:designId → { id, name, description, motorType, revisions }. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const ids = designParams(params);
  const design = ids ? await listDesignRevisions(ids.designId) : null;
  if (!design) return apiError(404, `No design ${params.designId}.`);
  return Response.json(design);
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
