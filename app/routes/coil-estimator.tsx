import {
  getFormProps,
  getInputProps,
  getSelectProps,
  useForm,
  type FieldMetadata,
} from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useEffect, useRef, useState } from "react";
import {
  Form,
  useFetcher,
  type ShouldRevalidateFunctionArgs,
  data,
} from "react-router";
import { postJson, type ApiAnswer } from "~/lib/api-request";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";
import type { Route } from "./+types/coil-estimator";
import { requireUser } from "~/auth/guard.server";
import { CoilDrawing } from "~/components/estimators/coil-drawing";
import { CoilResults } from "~/components/estimators/coil-results";
import { EndTurnHelper } from "~/components/estimators/end-turn-helper";
import { conductorSplit, type CoilEstimate } from "~/engineering/coil-estimate";
import { ConductorSplitBar } from "~/components/estimators/conductor-split-bar";
import {
  coilEstimatorDefaults,
  coilEstimatorFormSchema,
  coilRequestFromForm,
  formFieldOfApiField,
} from "~/lib/coil-estimator-form";
import { listWireSizes } from "~/reference/wire-sizes.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const [awg, iec] = await Promise.all([
    listWireSizes("AWG"),
    listWireSizes("IEC"),
  ]);
  return {
    awgSizes: awg.map((size) => ({
      label: size.size,
      bareDiameterMm: size.bareDiameterMm,
    })),
    iecSizes: iec.map((size) => ({ label: size.size, series: size.series })),
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Coil estimator · Turnledger" },
];

/** Asks POST /api/v1/coil-estimates in the browser; refusals come back as answers to show beside the fields. */
export async function clientAction({
  request,
}: Route.ClientActionArgs): Promise<
  ApiAnswer<CoilEstimate> & { input: CoilEstimateRequest }
> {
  const input = (await request.json()) as CoilEstimateRequest;
  return {
    ...(await postJson<CoilEstimate>(
      "/api/v1/coil-estimates",
      input,
      request.signal,
    )),
    input,
  };
}

/** The page calculates in the browser (clientAction); a plain form post has nothing to do here. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  throw data(
    {
      message:
        "This page calculates in your browser. Scripts: POST /api/v1/coil-estimates.",
    },
    { status: 405 },
  );
}

/** Estimates change nothing on the server: the page's data need not be read again after one. */
export function shouldRevalidate({
  formAction,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  return formAction?.startsWith("/tools/coil-estimator")
    ? false
    : defaultShouldRevalidate;
}

function NumberField({
  field,
  label,
  unit,
  hint,
  apiErrors,
  step = "any",
}: {
  field: FieldMetadata<number | string | undefined | null>;
  label: string;
  unit?: string;
  hint?: string;
  apiErrors?: string[];
  step?: string;
}) {
  const { key, ...props } = getInputProps(field, { type: "number" });
  const errors = field.errors ?? apiErrors;
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
        {unit ? (
          <span className="font-normal text-graphite-500"> ({unit})</span>
        ) : null}
      </label>
      <input
        key={key}
        {...props}
        step={step}
        inputMode="decimal"
        className="field-input"
        aria-invalid={errors ? true : undefined}
      />
      {hint ? <p className="mt-1 text-xs text-graphite-500">{hint}</p> : null}
      {errors ? (
        <p id={field.errorId} className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export default function CoilEstimator({ loaderData }: Route.ComponentProps) {
  const fetcher = useFetcher<typeof clientAction>();
  const [form, fields] = useForm({
    id: "coil-estimator",
    defaultValue: coilEstimatorDefaults,
    constraint: getZodConstraint(coilEstimatorFormSchema),
    shouldValidate: "onInput",
    onValidate({ formData }) {
      return parseWithZod(formData, { schema: coilEstimatorFormSchema });
    },
    onSubmit(event) {
      event.preventDefault();
      calculate(event.currentTarget);
    },
  });
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const [drawing, setDrawing] = useState({
    activeLengthMm: Number(coilEstimatorDefaults.activeLengthMm),
    endTurnLengthMm: Number(coilEstimatorDefaults.endTurnLengthMm),
  });
  function calculate(formElement: HTMLFormElement) {
    const submission = parseWithZod(new FormData(formElement), {
      schema: coilEstimatorFormSchema,
    });
    if (submission.status !== "success") return;
    void fetcher.submit(
      JSON.parse(JSON.stringify(coilRequestFromForm(submission.value))),
      {
        method: "post",
        action: "/tools/coil-estimator",
        encType: "application/json",
      },
    );
  }

  function onFormChange(event: React.FormEvent<HTMLFormElement>) {
    const formElement = event.currentTarget;
    const data = new FormData(formElement);
    setDrawing({
      activeLengthMm: Number(data.get("activeLengthMm") || Number.NaN),
      endTurnLengthMm: Number(data.get("endTurnLengthMm") || Number.NaN),
    });
    clearTimeout(timer.current);
    timer.current = setTimeout(() => calculate(formElement), 300);
  }

  // The first estimate, for the starting values.
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (formRef.current) calculate(formRef.current);
    return () => clearTimeout(timer.current);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  // The last good estimate stays on screen while the builder fixes a field.
  const answer = fetcher.data;
  const [lastGood, setLastGood] = useState<{
    estimate: CoilEstimate;
    input: CoilEstimateRequest;
  } | null>(null);
  const [seenAnswer, setSeenAnswer] = useState(answer);
  if (answer !== seenAnswer) {
    setSeenAnswer(answer);
    if (answer?.ok) setLastGood({ estimate: answer.data, input: answer.input });
  }
  const apiFieldErrors: Record<string, string[]> = {};
  if (answer && !answer.ok) {
    for (const [apiField, messages] of Object.entries(answer.fields)) {
      apiFieldErrors[formFieldOfApiField(apiField)] = messages;
    }
  }

  const standard = fields.standard.value ?? coilEstimatorDefaults.standard;
  const { key: conductorKey, ...conductorProps } = getSelectProps(
    fields.conductor,
  );
  const { key: standardKey, ...standardProps } = getSelectProps(
    fields.standard,
  );
  const { key: awgKey, ...awgProps } = getSelectProps(fields.awgSize);
  const { key: iecKey, ...iecProps } = getSelectProps(fields.iecDiameterMm);
  const { key: insulationKey, ...insulationProps } = getSelectProps(
    fields.insulation,
  );
  const selectError = (field: FieldMetadata<unknown>) => {
    const errors = field.errors ?? apiFieldErrors[field.name];
    return errors ? (
      <p id={field.errorId} className="field-error">
        {errors.join(" ")}
      </p>
    ) : null;
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold">Coil estimator</h1>
          <p className="mt-1 max-w-3xl text-graphite-500">
            Copper length, mass, resistance and loss of a coil from its
            geometry. Only the active sides lie in the field and make torque;
            the end turns add length, resistance and cost.
          </p>
        </div>
        <button
          type="button"
          className="button-quiet print:hidden"
          onClick={() => window.print()}
        >
          Print
        </button>
      </div>

      <div className="grid gap-6 xl:grid-cols-[26rem_1fr]">
        <Form
          method="post"
          {...getFormProps(form)}
          ref={formRef}
          onChange={onFormChange}
          className="panel space-y-5 print:border-0 print:shadow-none"
        >
          <fieldset className="grid grid-cols-2 gap-4">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Wire
            </legend>
            <div>
              <label htmlFor={fields.conductor.id} className="field-label">
                Conductor
              </label>
              <select
                key={conductorKey}
                {...conductorProps}
                className="field-input"
              >
                <option value="copper">Copper</option>
                <option value="aluminium">Aluminium</option>
              </select>
              {selectError(fields.conductor)}
            </div>
            <div>
              <label htmlFor={fields.standard.id} className="field-label">
                Sizes
              </label>
              <select
                key={standardKey}
                {...standardProps}
                className="field-input"
              >
                <option value="IEC">IEC 60317 (mm)</option>
                <option value="AWG">AWG</option>
              </select>
            </div>
            {standard === "AWG" ? (
              <div>
                <label htmlFor={fields.awgSize.id} className="field-label">
                  AWG size
                </label>
                <select key={awgKey} {...awgProps} className="field-input">
                  {loaderData.awgSizes.map((size) => (
                    <option key={size.label} value={size.label}>
                      {size.label} ({size.bareDiameterMm.toFixed(4)} mm)
                    </option>
                  ))}
                </select>
                {selectError(fields.awgSize)}
              </div>
            ) : (
              <div>
                <label
                  htmlFor={fields.iecDiameterMm.id}
                  className="field-label"
                >
                  Nominal diameter{" "}
                  <span className="font-normal text-graphite-500">(mm)</span>
                </label>
                <select key={iecKey} {...iecProps} className="field-input">
                  {loaderData.iecSizes.map((size) => (
                    <option key={size.label} value={size.label}>
                      {size.label}
                      {size.series === "r40" ? " (R40)" : ""}
                    </option>
                  ))}
                </select>
                {selectError(fields.iecDiameterMm)}
              </div>
            )}
            <div>
              <label htmlFor={fields.insulation.id} className="field-label">
                Insulation
              </label>
              <select
                key={insulationKey}
                {...insulationProps}
                className="field-input"
              >
                <option value="">not given</option>
                {standard === "AWG" ? (
                  <>
                    <option value="single">single build</option>
                    <option value="heavy">heavy build</option>
                    <option value="triple">triple build</option>
                  </>
                ) : (
                  <>
                    <option value="grade1">grade 1</option>
                    <option value="grade2">grade 2</option>
                    <option value="grade3">grade 3</option>
                  </>
                )}
              </select>
              {selectError(fields.insulation)}
            </div>
          </fieldset>

          <fieldset className="grid grid-cols-2 gap-4">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Coil
            </legend>
            <NumberField
              field={fields.turns}
              label="Turns"
              step="1"
              apiErrors={apiFieldErrors.turns}
            />
            <NumberField
              field={fields.strandsInHand}
              label="Strands in hand"
              step="1"
              apiErrors={apiFieldErrors.strandsInHand}
            />
            <NumberField
              field={fields.activeLengthMm}
              label="Active length"
              unit="mm"
              hint="Each coil side in the field"
              apiErrors={apiFieldErrors.activeLengthMm}
            />
            <NumberField
              field={fields.endTurnLengthMm}
              label="End-turn length"
              unit="mm"
              hint="Each of the two ends"
              apiErrors={apiFieldErrors.endTurnLengthMm}
            />
            <NumberField
              field={fields.leadLengthMm}
              label="Lead length"
              unit="mm"
              hint="Each of the two leads"
              apiErrors={apiFieldErrors.leadLengthMm}
            />
            <NumberField
              field={fields.coilCount}
              label="Coils"
              step="1"
              apiErrors={apiFieldErrors.coilCount}
            />
          </fieldset>

          <fieldset className="grid grid-cols-2 gap-4">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Operation
            </legend>
            <NumberField
              field={fields.temperatureC}
              label="Temperature"
              unit="°C"
              apiErrors={apiFieldErrors.temperatureC}
            />
            <NumberField
              field={fields.currentA}
              label="Current"
              unit="A"
              hint="Leave empty for no loss figure"
              apiErrors={apiFieldErrors.currentA}
            />
            <NumberField
              field={fields.scrapPercent}
              label="Scrap"
              unit="%"
              hint="Common practice: 2–5 % in production"
              apiErrors={apiFieldErrors.scrapPercent}
            />
          </fieldset>

          {answer && !answer.ok && Object.keys(answer.fields).length === 0 ? (
            <p role="alert" className="field-error">
              {answer.message}
            </p>
          ) : null}
          <button type="submit" className="button-primary w-full print:hidden">
            Estimate
          </button>
        </Form>

        <div className="space-y-6">
          <section aria-labelledby="drawing-heading" className="panel">
            <h2 id="drawing-heading" className="mb-2 text-lg font-semibold">
              The coil to scale
            </h2>
            <CoilDrawing
              activeLengthMm={drawing.activeLengthMm}
              endTurnLengthMm={drawing.endTurnLengthMm}
            />
          </section>
          <EndTurnHelper
            onUse={(lengthMm) => {
              form.update({
                name: fields.endTurnLengthMm.name,
                value: String(lengthMm),
              });
              setDrawing((current) => ({
                ...current,
                endTurnLengthMm: lengthMm,
              }));
              clearTimeout(timer.current);
              timer.current = setTimeout(
                () => formRef.current && calculate(formRef.current),
                50,
              );
            }}
          />
          {/* Busy until the first estimate is back; the results then say when a newer one is being worked out. */}
          <div className="panel" aria-busy={lastGood ? undefined : true}>
            {lastGood ? (
              <div className="space-y-6">
                <ConductorSplitBar split={conductorSplit(lastGood.input)} />
                <CoilResults
                  estimate={lastGood.estimate}
                  coilCount={lastGood.input.coilCount}
                  temperatureC={lastGood.input.temperatureC}
                  // Dimmed (and busy) while the estimate is worked out; once it
                  // is back the figures are final, though the root and layout
                  // loaders are still read again after it ("loading").
                  pending={
                    fetcher.state === "submitting" ||
                    Boolean(answer && !answer.ok)
                  }
                />
              </div>
            ) : (
              <p className="text-sm text-graphite-500" aria-live="polite">
                Calculating…
              </p>
            )}
          </div>
        </div>
      </div>
    </div>
  );
}
