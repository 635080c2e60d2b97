/**
 * Step 2 of a price-list import: one row per column of the file, each with a
 * choice of our fields, and what the mapping still lacks, checked live. One
 * column may feed both SKUs (a file whose item code is our own SKU).
 */
import {
  PRICE_LIST_FIELDS,
  sharedColumnFields,
  type PriceListField,
  type PriceListFieldInfo,
} from "~/price-lists/column-mapping";
import { TableScroll } from "~/components/table-scroll";

export interface MappedColumn {
  header: string;
  /** Our fields: none when the column is left out, two only for Supplier SKU and Our SKU. */
  fields: PriceListField[];
  /** Where the choice came from: the supplier's last import, a guess from the header, or the buyer. */
  source: "saved" | "guessed" | "chosen" | "none";
}

const sourceText: Record<MappedColumn["source"], string> = {
  saved: "from this supplier's last import",
  guessed: "guessed from the header — check it",
  chosen: "your choice",
  none: "",
};

function requirementText(
  info: PriceListFieldInfo,
  supplierCurrency: string | null,
): string {
  switch (info.requirement) {
    case "required":
      return "required";
    case "priceOrAdder":
      return "this or the other price field";
    case "unlessSupplierCurrency":
      return supplierCurrency
        ? `optional, default ${supplierCurrency}`
        : "required";
    default:
      return "";
  }
}

/** A choice in a column's list: its fields joined by "+" ("" leaves the column out). */
const choiceOf = (fields: readonly PriceListField[]) => fields.join("+");
const fieldsOf = (choice: string) =>
  choice === "" ? [] : (choice.split("+") as PriceListField[]);
const bothSkusChoice = choiceOf(sharedColumnFields);

export function ColumnMappingEditor({
  columns,
  sampleRow,
  supplierCurrency,
  messages,
  onChange,
}: {
  columns: MappedColumn[];
  /** The first data row's cells, to help tell the columns apart. */
  sampleRow: string[];
  supplierCurrency: string | null;
  /** What checkColumnMapping says about the current choice; empty when it is complete. */
  messages: string[];
  onChange: (index: number, fields: PriceListField[]) => void;
}) {
  const hintOf = (fields: readonly PriceListField[]) =>
    fields.length > 1
      ? "The same code is the supplier's SKU and our catalogue SKU: each row prices that item of our catalogue."
      : PRICE_LIST_FIELDS.find((info) => info.key === fields[0])?.hint;
  return (
    <div className="space-y-4">
      <TableScroll
        label="Columns of the file and the fields they feed"
        className="panel p-0"
      >
        <table className="data-table">
          <caption className="sr-only">
            Columns of the file and the fields they feed
          </caption>
          <thead>
            <tr>
              <th scope="col">Column in the file</th>
              <th scope="col">First value</th>
              <th scope="col">Feeds the field</th>
            </tr>
          </thead>
          <tbody>
            {columns.map((column, index) => (
              <tr key={`${index}-${column.header}`}>
                <th
                  scope="row"
                  className="pt-4 align-top font-medium text-graphite-900"
                >
                  {column.header || (
                    <em className="text-graphite-500">(no heading)</em>
                  )}
                </th>
                <td className="max-w-64 truncate pt-4 text-graphite-700">
                  {sampleRow[index] || "—"}
                </td>
                <td className="min-w-72">
                  <label htmlFor={`map-column-${index}`} className="sr-only">
                    Field for the column “{column.header}”
                  </label>
                  <select
                    id={`map-column-${index}`}
                    value={choiceOf(column.fields)}
                    onChange={(event) =>
                      onChange(index, fieldsOf(event.target.value))
                    }
                    aria-describedby={`map-column-${index}-note`}
                    className="field-input mt-0"
                  >
                    <option value="">Leave out</option>
                    {PRICE_LIST_FIELDS.map((info) => {
                      const requirement = requirementText(
                        info,
                        supplierCurrency,
                      );
                      return (
                        <option key={info.key} value={info.key}>
                          {info.label}
                          {requirement ? ` (${requirement})` : ""}
                        </option>
                      );
                    })}
                    <option value={bothSkusChoice}>
                      Supplier SKU and Our SKU (the same code)
                    </option>
                  </select>
                  <p
                    id={`map-column-${index}-note`}
                    className="mt-1 text-xs text-graphite-500"
                  >
                    {column.fields.length > 0
                      ? hintOf(column.fields)
                      : "Not imported."}
                    {sourceText[column.source] ? (
                      <span
                        className={
                          column.source === "guessed"
                            ? "ml-1 font-medium text-caution"
                            : "ml-1 font-medium text-field"
                        }
                      >
                        · {sourceText[column.source]}
                      </span>
                    ) : null}
                  </p>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <div role="status" aria-live="polite">
        {messages.length > 0 ? (
          <div className="rounded-md border border-danger/40 bg-danger/5 px-4 py-3">
            <p className="font-medium text-danger">
              The mapping is not complete yet:
            </p>
            <ul className="mt-1 list-disc pl-5 text-sm text-danger">
              {messages.map((message) => (
                <li key={message}>{message}</li>
              ))}
            </ul>
          </div>
        ) : (
          <p className="rounded-md border border-ok/40 bg-ok/10 px-4 py-3 text-ok">
            Every needed field has a column.
          </p>
        )}
      </div>
    </div>
  );
}
