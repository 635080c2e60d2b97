import { getZodConstraint } from "@conform-to/zod/v4";
import { type ShouldRevalidateFunctionArgs, data } from "react-router";
import type { Route } from "./+types/magnet-estimator";
import { requireUser } from "~/auth/guard.server";
import {
  requestMagnetEstimate,
  type EstimateAnswer,
} from "~/components/estimators/magnet-estimate-api";
import { MagnetEstimateForm } from "~/components/estimators/magnet-estimate-form";
import { MagnetEstimatePanel } from "~/components/estimators/magnet-estimate-panel";
import type { EstimatedInput } from "~/components/estimators/magnet-estimate-results";
import { startingMagnetInput } from "~/components/estimators/magnet-estimator-form";
import { useMagnetEstimate } from "~/components/estimators/use-magnet-estimate";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import {
  estimateMagnet,
  magnetTemperatureRange,
} from "~/engineering/magnet-estimate";
import type { MagnetGrade } from "~/engineering/reference-data";
import { magnetEstimateRequestSchema } from "~/lib/estimate-requests";
import { listMagnetGrades } from "~/reference/magnet-grades.server";
import { compareMagnetGrades } from "~/reference/magnet-materials";

/** The temperatures the estimate answers for a grade, for the field's hint. */
function usableTemperatures(grade: MagnetGrade) {
  const range = magnetTemperatureRange(grade);
  return {
    usableMinC: range.minC,
    usableMaxC: range.maxC,
    curieTemperatureC: range.curieTemperatureC,
  };
}

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const grades = (await listMagnetGrades()).sort(compareMagnetGrades);
  const startingGrade =
    grades.find((grade) => grade.name === startingMagnetInput.grade) ??
    grades[0];
  const input = startingGrade
    ? { ...startingMagnetInput, grade: startingGrade.name }
    : startingMagnetInput;
  return {
    constraint: getZodConstraint(magnetEstimateRequestSchema),
    grades: grades.map((grade) => ({
      ...usableTemperatures(grade),
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

export default function MagnetEstimator({ loaderData }: Route.ComponentProps) {
  const { grades, startingAnswer, constraint } = loaderData;
  const {
    form,
    fields,
    formRef,
    onFormChange,
    answer,
    showApiRefusal,
    apiErrors,
    waitingFor,
    updating,
  } = useMagnetEstimate(
    "/tools/magnet-estimator",
    startingAnswer,
    constraint,
  );

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
        <MagnetEstimateForm
          form={form}
          fields={fields}
          formRef={formRef}
          onFormChange={onFormChange}
          grades={grades}
          apiErrors={apiErrors}
        />
        <MagnetEstimatePanel
          answer={answer}
          grades={grades}
          updating={updating}
          waitingFor={waitingFor}
          showApiRefusal={showApiRefusal}
          apiErrors={apiErrors}
        />
      </div>
    </div>
  );
}
