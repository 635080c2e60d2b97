import { getFormProps } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { Form, type ShouldRevalidateFunctionArgs, data } from "react-router";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";
import type { Route } from "./+types/coil-estimator";
import { requireUser } from "~/auth/guard.server";
import { CoilDrawing } from "~/components/estimators/coil-drawing";
import { CoilFrequencyFields } from "~/components/estimators/coil-frequency-fields";
import { CoilOperationFields } from "~/components/estimators/coil-operation-fields";
import { CoilResultsPanel } from "~/components/estimators/coil-results-panel";
import { CoilWindingFields } from "~/components/estimators/coil-winding-fields";
import { CoilWireFields } from "~/components/estimators/coil-wire-fields";
import { EndTurnHelper } from "~/components/estimators/end-turn-helper";
import {
  useCoilEstimate,
  type CoilEstimateAnswer,
} from "~/components/estimators/use-coil-estimate";
import { coilEstimatorFormSchema } from "~/lib/coil-estimator-form";
import { listWireSizes } from "~/reference/wire-sizes.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const [awg, iec] = await Promise.all([
    listWireSizes("AWG"),
    listWireSizes("IEC"),
  ]);
  return {
    constraint: getZodConstraint(coilEstimatorFormSchema),
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

/**
 * Asks POST /api/v1/coil-estimates in the browser; refusals come back as answers to show
 * beside the fields. The API client is loaded with import() once the page runs (it is
 * not first-load JavaScript; decision 051).
 */
export async function clientAction({
  request,
}: Route.ClientActionArgs): Promise<CoilEstimateAnswer> {
  const [input, { apiClient }, { apiAnswer }] = await Promise.all([
    request.json() as Promise<CoilEstimateRequest>,
    import("~/api-client/client"),
    import("~/lib/api-request"),
  ]);
  return {
    ...(await apiAnswer(
      apiClient.POST("/api/v1/coil-estimates", {
        body: input,
        signal: request.signal,
      }),
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

export default function CoilEstimator({ loaderData }: Route.ComponentProps) {
  const {
    form,
    fields,
    formRef,
    onFormChange,
    drawing,
    applyEndTurnLength,
    answer,
    lastGood,
    apiFieldErrors,
    pending,
  } = useCoilEstimate(
    "/tools/coil-estimator",
    loaderData.constraint,
  );

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold">Coil estimator</h1>
          <p className="mt-1 max-w-3xl text-graphite-500">
            Copper length, mass, resistance and loss of a coil from its
            geometry, with current density, AC resistance at a frequency and the
            operating temperature. Only the active sides lie in the field and
            make torque; the end turns add length, resistance and cost.
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
          <CoilWireFields
            fields={fields}
            awgSizes={loaderData.awgSizes}
            iecSizes={loaderData.iecSizes}
            apiFieldErrors={apiFieldErrors}
          />
          <CoilWindingFields fields={fields} apiFieldErrors={apiFieldErrors} />
          <CoilOperationFields
            fields={fields}
            apiFieldErrors={apiFieldErrors}
          />
          <CoilFrequencyFields
            fields={fields}
            apiFieldErrors={apiFieldErrors}
          />

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
          <EndTurnHelper onUse={applyEndTurnLength} />
          <CoilResultsPanel lastGood={lastGood} pending={pending} />
        </div>
      </div>
    </div>
  );
}
