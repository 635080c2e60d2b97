/**
 * The import page's column choices: one per column of the file, offered from
 * what the buyer chose before, the supplier's saved mapping or the header's
 * words, and turned into the mapping the API takes. Pure.
 */
import type { MappedColumn } from "~/components/price-import/column-mapping-editor";
import {
  suggestMapping,
  type ColumnMapping,
  type ColumnMappingEntry,
} from "~/price-lists/column-mapping";

/**
 * A choice for each column: what the buyer chose for a column of the same
 * header before (a corrected file chosen again keeps those choices), else the
 * supplier's saved mapping or a match on the header's words.
 */
export function suggestColumns(
  headers: readonly string[],
  savedMapping: ColumnMapping | null,
  chosenBefore: readonly MappedColumn[] = [],
): MappedColumn[] {
  const suggested = suggestMapping(headers, savedMapping);
  return headers.map((header) => {
    const chosen = chosenBefore.find((entry) => entry.header === header);
    if (chosen) return chosen;
    const hits = suggested.filter((entry) => entry.header === header);
    return hits.length > 0
      ? {
          header,
          fields: hits.map((hit) => hit.field),
          source: hits[0]!.source,
        }
      : { header, fields: [], source: "none" };
  });
}

/** The choices as mapping entries: a column feeding two fields gives two. */
export function mappingEntries(
  columns: readonly MappedColumn[],
): ColumnMappingEntry[] {
  return columns.flatMap((column) =>
    column.fields.map((field) => ({ header: column.header, field })),
  );
}
