/**
 * What the lot API routes share: the lot a path names by its number (`?sku=` narrows it),
 * and the lot as the API shows it: `{ id, number, sku, supplier, supplierBatch }`.
 */
import { readSearchParams } from "~/lib/api.server";
import { findLot, lotByNumber } from "./lot-details.server";
import { lotQuerySchema } from "./lot-hold-requests";

/** The lot the path names; throws DomainError 404 (none) or 409 (several items, no ?sku=). */
export async function lotOfApiPath(
  request: Request,
  number: string | undefined,
) {
  const { sku } = readSearchParams(request, lotQuerySchema);
  const found = await lotByNumber(number ?? "", sku ?? null);
  const lot = (await findLot(found.id))!;
  return {
    lot,
    json: {
      id: lot.id,
      number: lot.number,
      sku: lot.item.sku,
      supplier: lot.supplier,
      supplierBatch: lot.supplierBatch,
    },
  };
}
