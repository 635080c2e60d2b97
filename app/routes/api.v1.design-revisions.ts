import type { Route } from "./+types/api.v1.design-revisions";
import { requireCapability } from "~/auth/guard.server";
import { designParams } from "~/designs/design-params";
import { startNewRevision } from "~/designs/designs.server";
import { apiError, methodNotAllowed } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "editDesigns");
  return methodNotAllowed(["POST"]);
}

/** POST /api/v1/designs/:designId/revisions (builder, admin): the next revision, a draft copy of the latest → 201 { revision }. */
export async function action({ request, params }: Route.ActionArgs) {
  await requireCapability(request, "editDesigns");
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const ids = designParams(params);
  if (!ids) return apiError(404, `No design ${params.designId}.`);
  return answerDomainError(async () =>
    Response.json(await startNewRevision(ids.designId), { status: 201 }),
  );
}
