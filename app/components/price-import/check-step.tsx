import { PriceListCheckResults } from "./price-list-check-results";
import type { PriceListAnswer, PriceListCheck } from "./price-list-upload";
import { UploadProgressBar } from "./upload-progress-bar";
import { StepHeading, StepWaiting } from "./step-heading";

/** Step 3: a dry run of the whole file on the server, and what it found. */
export function CheckStep({
  ready,
  fileName,
  mappingOk,
  busy,
  checking,
  checked,
  onCheck,
}: {
  /** The supplier and the file are chosen. */
  ready: boolean;
  fileName: string;
  mappingOk: boolean;
  /** A check or an import is on its way. */
  busy: boolean;
  checking: boolean;
  /** The dry run's answer for the file and choices on screen. */
  checked: PriceListAnswer<PriceListCheck> | null;
  onCheck: () => void;
}) {
  return (
    <section aria-labelledby="step-check" className="panel space-y-4">
      <div id="step-check">
        <StepHeading number={3}>Check the rows</StepHeading>
      </div>
      {!ready ? (
        <StepWaiting>Choose the supplier and the file first.</StepWaiting>
      ) : (
        <>
          <div className="flex flex-wrap items-center gap-3">
            <button
              type="button"
              onClick={onCheck}
              disabled={!mappingOk || busy}
              className="button-quiet min-h-10 px-4 disabled:cursor-not-allowed disabled:opacity-50"
            >
              {checking
                ? "Checking…"
                : checked
                  ? "Check again"
                  : "Check the rows"}
            </button>
            <p className="text-sm text-graphite-500">
              Reads every row on the server; nothing is stored yet.
            </p>
          </div>
          {checking ? (
            <UploadProgressBar step="check" fileName={fileName} />
          ) : null}
          {checked && !checked.ok ? (
            <p role="alert" className="field-error">
              {checked.message}
            </p>
          ) : null}
          {checked?.ok ? <PriceListCheckResults check={checked.data} /> : null}
        </>
      )}
    </section>
  );
}
