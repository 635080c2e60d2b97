import type { Route } from "./+types/api.v1.supplier";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { idFromText } from "~/lib/search-params";
import {
  findSupplier,
  updateSupplier,
} from "~/purchasing/supplier-details.server";
import { supplierPatchSchema } from "~/purchasing/supplier-schemas";
import { answerDomainError } from "~/lib/api-errors.server";

async function supplierAnswer(id: number | null) {
  const supplier = id === null ? null : await findSupplier(id);
  if (!supplier) return null;
  return {
    id: supplier.id,
    name: supplier.name,
    email: supplier.email,
    currency: supplier.currency,
    leadTimeDays: supplier.leadTimeDays,
    notes: supplier.notes,
    orderEmail: supplier.orderEmail,
    metalBaseFixedAt: supplier.metalBaseFixedAt,
    wireTolerancePercent: supplier.wireTolerancePercent,
    pieceTolerancePercent: supplier.pieceTolerancePercent,
  };
}

const noSuchSupplier = (text: string) =>
  apiError(404, `No supplier with id "${text}".`);

/**
 * GET /api/v1/suppliers/:supplierId → { id, name, email, currency, leadTimeDays, notes,
 * orderEmail, metalBaseFixedAt ("order" | "delivery"), wireTolerancePercent, pieceTolerancePercent }.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const supplier = await supplierAnswer(idFromText(params.supplierId));
  if (!supplier) return noSuchSupplier(params.supplierId);
  return Response.json(supplier);
}

/**
 * PATCH /api/v1/suppliers/:supplierId (buyer, admin) with any of name, email, currency,
 * leadTimeDays, notes, orderEmail, metalBaseFixedAt, wireTolerancePercent and
 * pieceTolerancePercent (0–100; null clears the optional ones) → 200 the supplier; 400 for bad
 * fields, 404 for no such supplier, 409 when another supplier has the name.
 */
export async function action({ request, params }: Route.ActionArgs) {
  await requireCapability(request, "keepSuppliers");
  if (request.method !== "PATCH") return methodNotAllowed(["GET", "PATCH"]);
  const id = idFromText(params.supplierId);
  if (id === null) return noSuchSupplier(params.supplierId);
  const patch = await readJsonBody(request, supplierPatchSchema);
  return answerDomainError(async () => {
    await updateSupplier(id, patch);
    return Response.json(await supplierAnswer(id));
  });
}
