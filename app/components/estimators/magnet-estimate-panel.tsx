import { shapeFieldLabels } from "~/components/magnet-shape-fields";
import type { EstimateAnswer } from "./magnet-estimate-api";
import {
  MagnetEstimateInputs,
  MagnetEstimateResults,
  MagnetEstimateWarnings,
  type GradeSummary,
} from "./magnet-estimate-results";
import { messagesOfOtherFields, waitingForText } from "./magnet-estimator-form";

/** How the fields are named in messages ("Waiting for a valid height"), by form name. */
const fieldLabels: Record<string, string> = {
  grade: "grade",
  count: "pieces",
  temperatureC: "magnet temperature",
  br20T: "Br at 20 °C",
  magnetLengthMm: "magnet length along magnetisation",
  airGapMm: "air gap",
  demagnetisingFieldKAm: "demagnetising field",
  ...shapeFieldLabels,
};

/**
 * The estimate for the last complete input (dimmed while fields are refused), what is
 * being waited for, the API's refusal, and the limits of a first-order estimate.
 */
export function MagnetEstimatePanel({
  answer,
  grades,
  updating,
  waitingFor,
  showApiRefusal,
  apiErrors,
}: {
  answer: EstimateAnswer | null;
  grades: GradeSummary[];
  /** A newer estimate is on its way. */
  updating: boolean;
  /** Form fields the browser's check refuses. */
  waitingFor: string[];
  showApiRefusal: boolean;
  apiErrors: Record<string, string[]>;
}) {
  const otherApiErrors = messagesOfOtherFields(apiErrors, fieldLabels);
  const answeredGrade: GradeSummary | undefined = answer?.ok
    ? grades.find((grade) => grade.name === answer.estimate.gradeName)
    : undefined;
  const waiting = waitingFor.length > 0;

  return (
    <section
      aria-labelledby="estimate-heading"
      className="panel h-fit space-y-4 lg:sticky lg:top-4 print:border-0 print:bg-transparent print:p-0 print:shadow-none"
    >
      <div className="flex items-center justify-between gap-4">
        <h2 id="estimate-heading" className="text-lg font-semibold">
          Estimate
          {answer?.ok ? (
            <span className="font-normal text-graphite-500">
              {" "}
              · {answer.estimate.gradeName}
            </span>
          ) : null}
        </h2>
        <button
          type="button"
          className="button-primary print:hidden"
          onClick={() => window.print()}
          disabled={!answer?.ok}
        >
          Print estimate
        </button>
      </div>

      <p
        role="status"
        className="min-h-5 text-sm text-graphite-500 print:hidden"
      >
        {updating
          ? "Updating…"
          : waiting
            ? waitingForText(waitingFor, fieldLabels)
            : ""}
      </p>

      {showApiRefusal && answer && !answer.ok ? (
        <div
          role="alert"
          className="rounded-md border border-danger/40 bg-danger/5 px-3 py-2 text-sm text-danger"
        >
          {answer.message} {otherApiErrors.join(" ")}
        </div>
      ) : null}

      {answer?.ok ? (
        <div className={waiting ? "opacity-50" : undefined}>
          <div className="mb-4 hidden print:block">
            <h3 className="mb-1 font-semibold">Inputs</h3>
            <MagnetEstimateInputs input={answer.input} />
            <h3 className="mb-1 mt-4 font-semibold">Results</h3>
          </div>
          <MagnetEstimateResults
            estimate={answer.estimate}
            input={answer.input}
            grade={answeredGrade}
          />
          <MagnetEstimateWarnings warnings={answer.estimate.warnings} />
        </div>
      ) : null}

      <p className="border-t border-rule pt-3 text-xs text-graphite-500">
        First-order engineering estimates: published grade values, straight-line
        temperature coefficients within the grade&rsquo;s usable range, no
        leakage; the winding&rsquo;s field counts only as you give it.
        Electrical safety, insulation systems and certification follow local
        codes and licensed practice.
      </p>
    </section>
  );
}
