import type { Route } from "./+types/api.v1.magnet-estimates";
import { requireUser } from "~/auth/guard.server";
import { estimateMagnet } from "~/engineering/magnet-estimate";
import type { MagnetGrade } from "~/engineering/reference-data";
import {
  apiError,
  calculateOr400,
  methodNotAllowed,
  readJsonBody,
} from "~/lib/api.server";
import {
  magnetEstimateRequestSchema,
  type MagnetEstimateRequest,
} from "~/lib/estimate-requests";
import { findMagnetGradeByName } from "~/reference/magnet-grades.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/** A grade made from typed properties (a maker's data sheet) rather than the grade table. */
function gradeFromProperties(
  properties: NonNullable<MagnetEstimateRequest["properties"]>,
): MagnetGrade {
  return {
    key: "custom",
    name: properties.name,
    aliases: [],
    material: properties.material,
    temperatureSuffix: null,
    brMinT: properties.br20T,
    brMaxT: properties.br20T,
    hcbMinKAm: 0,
    // 0 when not given: the estimate then makes no knee check.
    hcjMinKAm: properties.hcjKAm ?? 0,
    bhMaxMinKJm3: 0,
    bhMaxMaxKJm3: 0,
    maxWorkingTemperatureC: properties.maxWorkingTemperatureC,
    brTemperatureCoefficientPerK: properties.brTemperatureCoefficientPerK,
    densityGPerCm3: properties.densityGPerCm3,
    recoilPermeability: properties.recoilPermeability,
    coercivityFallsWhenCold: properties.material === "hard-ferrite",
    hcjTemperatureCoefficientPerK:
      properties.hcjTemperatureCoefficientPerK ?? null,
    curieTemperatureC: properties.curieTemperatureC ?? null,
    source: "typed by the user",
  };
}

/**
 * POST /api/v1/magnet-estimates: volume, mass, Br and HcJ at temperature, air-gap flux
 * density and the knee check of magnets of a grade (from the grade table) or of typed
 * properties. A temperature outside the grade's usable range (at or above the Curie
 * temperature, or past the top of the linear Br model) is a 400 on temperatureC.
 */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const input = await readJsonBody(request, magnetEstimateRequestSchema);
  let grade: MagnetGrade;
  if (input.grade) {
    const found = await findMagnetGradeByName(input.grade);
    if (!found) {
      const message = `Unknown magnet grade "${input.grade}": see GET /api/v1/magnet-grades.`;
      return apiError(400, message, { grade: [message] });
    }
    grade = found;
  } else {
    grade = gradeFromProperties(input.properties!);
  }
  return Response.json(
    calculateOr400(() => estimateMagnet({ ...input, grade })),
  );
}
