/** The column mapping each supplier's last import confirmed, for the import page to start from. */
import { db } from "~/db/client.server";
import { supplierMappings } from "~/db/schema";
import type { ColumnMappingEntry } from "~/price-lists/column-mapping";
import { columnMappingSchema } from "~/price-lists/column-mapping-schema";

/** Saved mappings by supplier id; a stored mapping that no longer reads is left out. */
export async function listSavedColumnMappings(): Promise<
  Record<number, ColumnMappingEntry[]>
> {
  const rows = await db
    .select({
      supplierId: supplierMappings.supplierId,
      mapping: supplierMappings.mapping,
    })
    .from(supplierMappings)
    .limit(1000);
  const bySupplier: Record<number, ColumnMappingEntry[]> = {};
  for (const row of rows) {
    const parsed = columnMappingSchema.safeParse(safeJson(row.mapping));
    if (parsed.success) bySupplier[row.supplierId] = parsed.data;
  }
  return bySupplier;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
