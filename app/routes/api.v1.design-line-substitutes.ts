import type { Route } from "./+types/api.v1.design-line-substitutes";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { designParams } from "~/designs/design-params";
import {
  findRevision,
  lineView,
  loadRevisionLines,
  revisionView,
} from "~/designs/design-revisions.server";
import {
  substituteChoiceSchema,
  substituteQuerySchema,
} from "~/designs/wire-substitute-schemas";
import {
  applyWireSubstitute,
  listLineSubstitutes,
  type LineRef,
} from "~/designs/wire-substitutes.server";
import {
  apiError,
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { idFromText } from "~/lib/search-params";

/** The line named by the path (`:line` is its position, from 1); null when not whole numbers ≥ 1. */
function lineRefOf(params: Route.LoaderArgs["params"]): LineRef | null {
  const ids = designParams(params);
  const position = idFromText(params.line);
  return ids && position !== null ? { ...ids, position } : null;
}

const noSuchLine = () => apiError(404, "No such design revision line.");

/**
 * GET /api/v1/designs/:designId/revisions/:revision/lines/:line/substitutes[?tolerance=3]
 * (any signed-in role): wire in stock that can stand in for a coil line's wire →
 * { line, tolerancePercent, substitutes: [{ sku, strands, areaChangePercent,
 * resistanceChangePercent, grossFill, costPerMotorChange, onHandKg, … }] }, closest area
 * first. 404 unknown design, revision or line; 409 not a coil line (decision 037).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const ref = lineRefOf(params);
  if (!ref) return noSuchLine();
  const { tolerance } = readSearchParams(request, substituteQuerySchema);
  return answerDomainError(async () =>
    Response.json(await listLineSubstitutes(ref, tolerance / 100)),
  );
}

/**
 * POST the same path { sku, strands } (builder, admin): applies a substitute. A released
 * revision gets a new draft revision with that line changed → 201; a draft changes in
 * place → 200; both answer the revision with its lines. 409, writing nothing, when the
 * design has a draft already, the choice is not among the current substitutes or the line
 * is not a coil line.
 */
export async function action({ request, params }: Route.ActionArgs) {
  await requireCapability(request, "editDesigns");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const ref = lineRefOf(params);
  if (!ref) return noSuchLine();
  const { tolerance } = readSearchParams(request, substituteQuerySchema);
  const choice = await readJsonBody(request, substituteChoiceSchema);
  return answerDomainError(async () => {
    const applied = await applyWireSubstitute(ref, choice, tolerance / 100);
    const found = await findRevision(ref.designId, applied.revision);
    const lines = await loadRevisionLines(found!.revision.id, found!.revision);
    return Response.json(
      {
        ...revisionView(found!.design, found!.revision),
        lines: lines.map(lineView),
      },
      { status: applied.status },
    );
  });
}
