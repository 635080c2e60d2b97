import type { Route } from "./+types/api.v1.design-revision";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { designParams } from "~/designs/design-params";
import {
  findRevision,
  lineView,
  loadRevisionLines,
  revisionView,
} from "~/designs/design-revisions.server";
import { revisionUpdateSchema } from "~/designs/design-schemas";
import { updateDraftRevision } from "~/designs/designs.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";

/** GET /api/v1/designs/:designId/revisions/:revision → the revision's fields and lines. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const ids = designParams(params);
  const found = ids ? await findRevision(ids.designId, ids.revision) : null;
  if (!found) return apiError(404, "No such design revision.");
  const lines = await loadRevisionLines(found.revision.id);
  return Response.json({
    ...revisionView(found.design, found.revision),
    lines: lines.map(lineView),
  });
}

/**
 * PUT …/revisions/:revision (builder, admin): changes a draft — the fields given, and the whole
 * list of lines when `lines` is given. 409 for a released revision; 400 naming bad fields.
 */
export async function action({ request, params }: Route.ActionArgs) {
  await requireCapability(request, "editDesigns");
  if (request.method !== "PUT" && request.method !== "PATCH")
    return methodNotAllowed(["GET", "PUT"]);
  const ids = designParams(params);
  if (!ids) return apiError(404, "No such design revision.");
  const body = (await request
    .clone()
    .json()
    .catch(() => null)) as Record<string, unknown> | null;
  const parsed = await readJsonBody(request, revisionUpdateSchema);
  // Only the fields the body names change (a schema default must not overwrite a stored value).
  const change = Object.fromEntries(
    Object.entries(parsed).filter(([key]) => body && key in body),
  ) as typeof parsed;
  return answerDomainError(async () => {
    await updateDraftRevision(ids.designId, ids.revision, change);
    const found = await findRevision(ids.designId, ids.revision);
    const lines = await loadRevisionLines(found!.revision.id);
    return Response.json({
      ...revisionView(found!.design, found!.revision),
      lines: lines.map(lineView),
    });
  });
}
