import { Link } from "react-router";
import { formatQuantity } from "~/lib/format";
import { SheetChoice } from "./sheet-choice";
import { StepHeading } from "./step-heading";
import type { FileReading, ImportSupplier } from "./use-price-list-import";

/**
 * Step 1: the supplier the prices are for, and the file: a CSV (its header read in the
 * browser) or an .xlsx workbook (read by the server), with a choice of sheet when it has several.
 */
export function SourceStep({
  suppliers,
  supplierId,
  hasSavedMapping,
  reading,
  onChooseSupplier,
  onChooseFile,
  onChooseSheet,
}: {
  suppliers: ImportSupplier[];
  supplierId: string;
  /** The chosen supplier's last import left column choices to reuse. */
  hasSavedMapping: boolean;
  reading: FileReading;
  onChooseSupplier: (id: string) => void;
  onChooseFile: (file: File | undefined) => Promise<void>;
  onChooseSheet: (sheet: string) => void;
}) {
  return (
    <section aria-labelledby="step-source" className="panel space-y-4">
      <div id="step-source">
        <StepHeading number={1}>Supplier and file</StepHeading>
      </div>
      {suppliers.length === 0 ? (
        <p className="text-graphite-700">
          There are no suppliers yet.{" "}
          <Link to="/suppliers" className="text-copper-700 underline">
            Add the supplier first
          </Link>
          , then come back to import its list.
        </p>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="import-supplier" className="field-label">
            Supplier
          </label>
          <select
            id="import-supplier"
            value={supplierId}
            onChange={(event) => onChooseSupplier(event.target.value)}
            className="field-input"
          >
            <option value="">Choose the supplier…</option>
            {suppliers.map((entry) => (
              <option key={entry.id} value={entry.id}>
                {entry.name} ({entry.currency})
              </option>
            ))}
          </select>
          <p className="mt-1 text-xs text-graphite-500">
            {hasSavedMapping
              ? "Its last import's column choices are used where the headers match."
              : "The prices are stored for this supplier."}
          </p>
        </div>
        <div>
          <label htmlFor="import-file" className="field-label">
            Price list (CSV or .xlsx, up to 20 MB)
          </label>
          <input
            id="import-file"
            type="file"
            accept=".csv,.txt,.xlsx,text/csv,text/plain,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
            onChange={(event) => void onChooseFile(event.target.files?.[0])}
            aria-invalid={reading.state === "failed" ? true : undefined}
            aria-describedby="import-file-note"
            className="field-input file:mr-3 file:rounded file:border-0 file:bg-copper-50 file:px-3 file:py-1 file:text-copper-700"
          />
          <div id="import-file-note" aria-live="polite">
            {reading.state === "failed" ? (
              <p className="field-error">{reading.message}</p>
            ) : reading.state === "reading" ? (
              <p role="status" className="mt-1 text-sm text-graphite-700">
                {reading.file.name.toLowerCase().endsWith(".xlsx")
                  ? "Reading the workbook…"
                  : "Reading the file\u2019s header…"}
              </p>
            ) : reading.state === "read" ? (
              <p className="mt-1 text-xs text-graphite-500">
                {reading.file.name}:{" "}
                {formatQuantity(reading.file.size / 1024, "KB", 1)},{" "}
                {reading.headers.length} columns,{" "}
                {reading.format === "xlsx"
                  ? `from the sheet “${reading.sheet}”.`
                  : `read as ${reading.encoding}.`}
              </p>
            ) : (
              <p className="mt-1 text-xs text-graphite-500">
                A CSV (comma, semicolon or tab separated) or an .xlsx workbook;
                the first row names the columns.
              </p>
            )}
          </div>
        </div>
        {reading.state === "read" && reading.format === "xlsx" ? (
          <SheetChoice
            sheets={reading.sheets}
            sheet={reading.sheet}
            onChooseSheet={onChooseSheet}
          />
        ) : null}
      </div>
    </section>
  );
}
