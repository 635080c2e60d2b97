/**
 * What the lot API routes share: the lot a path names by its number (`?sku=` narrows it),
 * and the lot as the API shows it: `{ id, number, sku, supplier, supplierBatch }`.
 */
import { findLot, lotByNumber } from "./lot-details.server";

/** `?sku=` from the address, trimmed; null when not given. */
function skuOf(request: Request): string | null {
  const sku = new URL(request.url).searchParams.get("sku")?.trim();
  return sku ? sku.slice(0, 40) : null;
}

/** The lot the path names; throws DomainError 404 (none) or 409 (several items, no ?sku=). */
export async function lotOfApiPath(
  request: Request,
  number: string | undefined,
) {
  const found = await lotByNumber((number ?? "").slice(0, 40), skuOf(request));
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
