import type { Route } from "./+types/api.v1.suppliers";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { supplierSchema } from "~/purchasing/supplier-schemas";
import { createSupplier, listSuppliers } from "~/purchasing/suppliers.server";
import { answerDomainError } from "~/lib/api-errors.server";

/**
 * GET /api/v1/suppliers → [{ id, name, email, currency, leadTimeDays, notes, orderEmail,
 * metalBaseFixedAt, wireTolerancePercent, pieceTolerancePercent }] (the id for /api/v1/suppliers/:id).
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return Response.json(await listSuppliers());
}

/** POST /api/v1/suppliers (buyer, admin) → 201 the supplier with its id; 409 when the name is taken. */
export async function action({ request }: Route.ActionArgs) {
  await requireCapability(request, "keepSuppliers");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const input = await readJsonBody(request, supplierSchema);
  return answerDomainError(async () => {
    const id = await createSupplier(input);
    return Response.json(
      {
        id,
        name: input.name,
        email: input.email ?? null,
        currency: input.currency,
        leadTimeDays: input.leadTimeDays ?? null,
        notes: input.notes ?? null,
        orderEmail: input.orderEmail ?? null,
        metalBaseFixedAt: input.metalBaseFixedAt,
        wireTolerancePercent: input.wireTolerancePercent,
        pieceTolerancePercent: input.pieceTolerancePercent,
      },
      { status: 201 },
    );
  });
}
