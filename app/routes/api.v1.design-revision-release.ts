import type { Route } from "./+types/api.v1.design-revision-release";
import { requireCapability } from "~/auth/guard.server";
import { designParams } from "~/designs/design-params";
import { releaseRevision } from "~/designs/designs.server";
import { apiError, methodNotAllowed } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "releaseDesigns");
  return methodNotAllowed(["POST"]);
}

/** POST …/revisions/:revision/release (builder, admin): locks the draft → 200 { revision, status }; 409 when released or empty. */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "releaseDesigns");
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const ids = designParams(params);
  if (!ids) return apiError(404, "No such revision.");
  return answerDomainError(async () => {
    await releaseRevision(ids.designId, ids.revision, user.id);
    return Response.json({ revision: ids.revision, status: "released" });
  });
}
