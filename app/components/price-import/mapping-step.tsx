import type { PriceListField } from "~/price-lists/column-mapping";
import {
  ColumnMappingEditor,
  type MappedColumn,
} from "./column-mapping-editor";
import { StepHeading, StepWaiting } from "./step-heading";
import type { FileReading, ImportSupplier } from "./use-price-list-import";

/** Step 2: which column of the file holds what, once the file's header is read. */
export function MappingStep({
  reading,
  supplier,
  columns,
  messages,
  onChooseFields,
}: {
  reading: FileReading;
  supplier: ImportSupplier | undefined;
  columns: MappedColumn[];
  /** What the column choices still lack or get wrong. */
  messages: string[];
  onChooseFields: (index: number, fields: PriceListField[]) => void;
}) {
  return (
    <section aria-labelledby="step-mapping" className="panel space-y-4">
      <div id="step-mapping">
        <StepHeading number={2}>Match the columns</StepHeading>
      </div>
      {reading.state === "read" ? (
        <>
          <p className="text-sm text-graphite-700">
            Needed: a Supplier SKU column, a Price per unit or Adder per kg
            column, and a Currency column
            {supplier
              ? ` (optional: ${supplier.name} defaults to ${supplier.currency})`
              : " unless the supplier has a default currency"}
            . Columns left out are not imported.
          </p>
          <ColumnMappingEditor
            columns={columns}
            sampleRow={reading.sampleRow}
            supplierCurrency={supplier?.currency ?? null}
            messages={messages}
            onChange={onChooseFields}
          />
        </>
      ) : (
        <StepWaiting>Choose a file first; its columns appear here.</StepWaiting>
      )}
    </section>
  );
}
