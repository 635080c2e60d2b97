import { ImportDone } from "./import-done";
import {
  fixRowsText,
  importButtonText,
  importNoteText,
} from "./import-step-texts";
import { InvalidRowsTable } from "./price-list-check-results";
import type {
  PriceListAnswer,
  PriceListCheck,
  PriceListImport,
} from "./price-list-upload";
import { StepHeading, StepWaiting } from "./step-heading";
import { UploadProgressBar } from "./upload-progress-bar";

/** Step 4: the import itself, all or nothing, once the dry run found every row good. */
export function ImportStep({
  check,
  imported,
  importing,
  canImport,
  supplierName,
  fileName,
  onImport,
}: {
  /** The dry run's findings for the file and choices on screen. */
  check: PriceListCheck | null;
  imported: PriceListAnswer<PriceListImport> | null;
  importing: boolean;
  canImport: boolean;
  supplierName: string | undefined;
  fileName: string;
  onImport: () => void;
}) {
  return (
    <section aria-labelledby="step-import" className="panel space-y-4">
      <div id="step-import">
        <StepHeading number={4}>Import</StepHeading>
      </div>
      {imported?.ok ? (
        <ImportDone result={imported.data} />
      ) : !check ? (
        <StepWaiting>Check the rows first.</StepWaiting>
      ) : (
        <>
          <p className="text-sm text-graphite-700">
            The import is all or nothing: every row is stored, or none.
            {fixRowsText(check)}
          </p>
          <div className="flex flex-wrap items-center gap-3">
            <button
              type="button"
              onClick={onImport}
              disabled={!canImport}
              aria-describedby="import-note"
              className="button-primary min-h-11 px-6"
            >
              {importButtonText(check, importing)}
            </button>
            <p id="import-note" className="text-sm text-graphite-500">
              {importNoteText(check, supplierName)}
            </p>
          </div>
          {importing ? (
            <UploadProgressBar step="import" fileName={fileName} />
          ) : null}
          {imported && !imported.ok ? (
            <div role="alert" className="space-y-3">
              <p className="field-error">{imported.message}</p>
              {imported.invalid ? (
                <InvalidRowsTable
                  invalid={imported.invalid}
                  invalidCount={imported.invalidCount}
                />
              ) : null}
            </div>
          ) : null}
        </>
      )}
    </section>
  );
}
