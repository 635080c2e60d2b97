import type { Route } from "./+types/api.v1.designs";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { newDesignSchema } from "~/designs/design-schemas";
import { designListQuerySchema } from "~/designs/design-queries";
import { createDesign, listDesigns } from "~/designs/designs.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";

/** GET /api/v1/designs → [{ id, name, revisions: [{ revision, status, ratedTorqueNm }] }], paged (X-Total-Count). */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, designListQuerySchema);
  const { total, designs } = await listDesigns(query);
  return Response.json(
    designs.map(({ id, name, motorType, revisions }) => ({
      id,
      name,
      motorType,
      revisions,
    })),
    { headers: { "X-Total-Count": String(total) } },
  );
}

/** POST /api/v1/designs (builder, admin): the design with revision 1 as a draft → 201 { id, revision }. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "editDesigns");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const input = await readJsonBody(request, newDesignSchema);
  return answerDomainError(async () =>
    Response.json(await createDesign(input, user.id), { status: 201 }),
  );
}
