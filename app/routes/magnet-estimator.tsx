import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useRef, useState } from "react";
import {
  useFetcher,
  type ShouldRevalidateFunctionArgs,
  data,
} from "react-router";
import type { Route } from "./+types/magnet-estimator";
import { requireUser } from "~/auth/guard.server";
import {
  requestMagnetEstimate,
  type EstimateAnswer,
} from "~/components/estimators/magnet-estimate-api";
import {
  MagnetEstimateInputs,
  MagnetEstimateResults,
  MagnetEstimateWarnings,
  type EstimatedInput,
  type GradeSummary,
} from "~/components/estimators/magnet-estimate-results";
import { MagnetGradeSelect } from "~/components/estimators/magnet-grade-select";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import {
  MagnetDimensionInputs,
  MagnetShapePicker,
  shapeFieldLabels,
} from "~/components/magnet-shape-fields";
import { QuantityField } from "~/components/quantity-field";
import {
  estimateMagnet,
  type MagnetShape,
} from "~/engineering/magnet-estimate";
import {
  magnetEstimateRequestSchema,
  type MagnetEstimateRequest,
} from "~/lib/estimate-requests";
import { listMagnetGrades } from "~/reference/magnet-grades.server";
import { compareMagnetGrades } from "~/reference/magnet-materials";

/** The page opens on worked check 7 of the engineering brief: N42 (Br 1.30 T mid-range), l_m 4 mm, g 1 mm. */
const startingInput: EstimatedInput = {
  grade: "N42",
  shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 4 },
  count: 1,
  temperatureC: 20,
  br20T: null,
  magnetLengthMm: 4,
  airGapMm: 1,
};

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const grades = (await listMagnetGrades()).sort(compareMagnetGrades);
  const startingGrade =
    grades.find((grade) => grade.name === startingInput.grade) ?? grades[0];
  const input = startingGrade
    ? { ...startingInput, grade: startingGrade.name }
    : startingInput;
  return {
    grades: grades.map((grade) => ({
      name: grade.name,
      material: grade.material,
      brMinT: grade.brMinT,
      brMaxT: grade.brMaxT,
      hcjMinKAm: grade.hcjMinKAm,
      maxWorkingTemperatureC: grade.maxWorkingTemperatureC,
      brTemperatureCoefficientPerK: grade.brTemperatureCoefficientPerK,
      densityGPerCm3: grade.densityGPerCm3,
      recoilPermeability: grade.recoilPermeability,
    })),
    // The first answer comes with the page, so it shows before any script runs.
    startingAnswer: startingGrade
      ? ({
          ok: true,
          estimate: estimateMagnet({ ...input, grade: startingGrade }),
          input,
        } satisfies EstimateAnswer)
      : null,
  };
}

/**
 * Asks POST /api/v1/magnet-estimates for the estimate, in the browser. The
 * API's refusals (400 with field messages, 401 when the session has ended)
 * come back as answers for the page to show beside the fields.
 */
export async function clientAction({
  request,
}: Route.ClientActionArgs): Promise<EstimateAnswer> {
  return requestMagnetEstimate(
    (await request.json()) as EstimatedInput,
    request.signal,
  );
}

/** The page calculates in the browser (clientAction); a plain form post has nothing to do here. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  throw data(
    {
      message:
        "This page calculates in your browser. Scripts: POST /api/v1/magnet-estimates.",
    },
    { status: 405 },
  );
}

/** Estimates change nothing on the server, so the page's own data need not be read again after one. */
export function shouldRevalidate({
  formAction,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  return formAction?.startsWith("/tools/magnet-estimator")
    ? false
    : defaultShouldRevalidate;
}

export const meta: Route.MetaFunction = () => [
  { title: "Magnet estimator · Turnledger" },
];

/** How the fields are named in messages ("Waiting for a valid height"), by form name. */
const fieldLabels: Record<string, string> = {
  grade: "grade",
  count: "pieces",
  temperatureC: "magnet temperature",
  br20T: "Br at 20 °C",
  magnetLengthMm: "magnet length along magnetisation",
  airGapMm: "air gap",
  ...shapeFieldLabels,
};

/** The form's starting text for an input: Conform fills inputs from strings. */
function formValues(input: EstimatedInput) {
  const text = (value: number | null | undefined) =>
    value === null || value === undefined ? "" : String(value);
  return {
    grade: input.grade,
    shape: Object.fromEntries(
      Object.entries(input.shape).map(([key, value]) => [key, String(value)]),
    ),
    count: text(input.count),
    temperatureC: text(input.temperatureC),
    br20T: text(input.br20T),
    magnetLengthMm: text(input.magnetLengthMm),
    airGapMm: text(input.airGapMm),
  };
}

/** The API request for a checked form: the grade by name, blanks as null. */
function requestOf(value: MagnetEstimateRequest): EstimatedInput {
  return {
    grade: value.grade ?? "",
    shape: value.shape,
    count: value.count,
    temperatureC: value.temperatureC,
    br20T: value.br20T ?? null,
    magnetLengthMm: value.magnetLengthMm ?? null,
    airGapMm: value.airGapMm ?? null,
  };
}

export default function MagnetEstimator({ loaderData }: Route.ComponentProps) {
  const { grades, startingAnswer } = loaderData;
  const fetcher = useFetcher<typeof clientAction>();
  const formRef = useRef<HTMLFormElement>(null);
  const timer = useRef<ReturnType<typeof setTimeout>>(undefined);
  /** Fields the browser's check still refuses; the estimate shown is for the last complete input. */
  const [waitingFor, setWaitingFor] = useState<string[]>([]);
  /** The API's field messages stand until the person types again. */
  const [typedSinceAnswer, setTypedSinceAnswer] = useState(false);

  const [form, fields] = useForm<MagnetEstimateRequest>({
    id: "magnet-estimate",
    defaultValue: formValues(startingAnswer?.input ?? startingInput),
    constraint: getZodConstraint(magnetEstimateRequestSchema),
    shouldValidate: "onInput",
    onValidate({ formData }) {
      return parseWithZod(formData, { schema: magnetEstimateRequestSchema });
    },
    onSubmit(event) {
      event.preventDefault();
      estimate();
    },
  });
  const shape = fields.shape.getFieldset();
  const kind = (shape.kind.value ?? "block") as MagnetShape["kind"];

  function estimate() {
    clearTimeout(timer.current);
    if (!formRef.current) return;
    const submission = parseWithZod(new FormData(formRef.current), {
      schema: magnetEstimateRequestSchema,
    });
    if (submission.status !== "success") {
      setWaitingFor(
        Object.keys(submission.error ?? {}).filter(
          (name) => submission.error?.[name]?.length,
        ),
      );
      return;
    }
    setWaitingFor([]);
    setTypedSinceAnswer(false);
    void fetcher.submit(requestOf(submission.value), {
      method: "post",
      action: "/tools/magnet-estimator",
      encType: "application/json",
    });
  }

  function onFormChange() {
    setTypedSinceAnswer(true);
    clearTimeout(timer.current);
    timer.current = setTimeout(estimate, 300);
  }

  const answer = fetcher.data ?? startingAnswer;
  // The API's messages belong to the input they answered: gone once the person types or a newer answer is on its way.
  const showApiRefusal = Boolean(
    answer && !answer.ok && !typedSinceAnswer && fetcher.state === "idle",
  );
  const apiErrors = showApiRefusal && answer && !answer.ok ? answer.fields : {};
  const fieldNames = new Set(Object.keys(fieldLabels));
  const otherApiErrors = Object.entries(apiErrors)
    .filter(([name]) => !fieldNames.has(name))
    .flatMap(([, messages]) => messages);
  const answeredGrade: GradeSummary | undefined = answer?.ok
    ? grades.find((grade) => grade.name === answer.estimate.gradeName)
    : undefined;
  const updating = fetcher.state !== "idle";
  const waiting = waitingFor.length > 0;

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Magnet estimator</h1>
        <p className="mt-1 max-w-3xl text-graphite-500">
          Volume, mass and remanence of permanent magnets at their working
          temperature, and the flux density they drive across an air gap.
          Results are first-order estimates from the grade&rsquo;s published
          values: check a design against the maker&rsquo;s data sheet and a
          field calculation before you order.
        </p>
      </div>

      <MagnetHandlingCaution />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,28rem)_minmax(0,1fr)] print:block">
        <form
          method="post"
          {...getFormProps(form)}
          ref={formRef}
          onChange={onFormChange}
          aria-label="Magnet"
          className="panel space-y-6 print:hidden"
        >
          <MagnetGradeSelect
            field={fields.grade}
            grades={grades}
            extraErrors={apiErrors.grade}
          />

          <MagnetShapePicker field={shape.kind} />

          <fieldset className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-2 xl:grid-cols-3">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Dimensions of one piece
            </legend>
            <MagnetDimensionInputs
              fieldset={shape}
              kind={kind}
              apiErrors={apiErrors}
            />
            <QuantityField
              field={fields.count}
              label="Pieces"
              extraErrors={apiErrors.count}
            />
          </fieldset>

          <fieldset className="grid grid-cols-2 gap-4">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Temperature and Br
            </legend>
            <QuantityField
              field={fields.temperatureC}
              label="Magnet temperature"
              unit="°C"
              allowNegative
              extraErrors={apiErrors.temperatureC}
            />
            <QuantityField
              field={fields.br20T}
              label="Br at 20 °C"
              unit="T"
              hint="From the maker's data sheet; blank uses the middle of the grade's range"
              extraErrors={apiErrors.br20T}
            />
          </fieldset>

          <fieldset className="grid gap-4">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Air-gap flux density (optional)
            </legend>
            <QuantityField
              field={fields.magnetLengthMm}
              label="Magnet length along magnetisation"
              unit="mm"
              hint="For a surface magnet, its thickness"
              extraErrors={apiErrors.magnetLengthMm}
            />
            <QuantityField
              field={fields.airGapMm}
              label="Air gap"
              unit="mm"
              hint="The mechanical gap plus any non-magnetic sleeve"
              extraErrors={apiErrors.airGapMm}
            />
          </fieldset>
          <p className="text-xs text-graphite-500">
            Results follow as you type. Press Enter to update them at once.
          </p>
        </form>

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
                ? `Waiting for a valid ${waitingFor.map((name) => fieldLabels[name] ?? name).join(", ")}. The figures below are for the last complete input.`
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
            First-order engineering estimates: published grade values,
            reversible temperature change only, no leakage or armature reaction.
            Electrical safety, insulation systems and certification follow local
            codes and licensed practice.
          </p>
        </section>
      </div>
    </div>
  );
}
