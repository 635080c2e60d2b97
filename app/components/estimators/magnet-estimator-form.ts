/**
 * The magnet estimator's form, as text: its starting input, the form's values for an
 * input, the API request for a checked form, and what the estimate panel says while
 * fields are refused. Pure: no framework.
 */
import type { MagnetEstimateRequest } from "~/lib/estimate-requests";
import type { EstimatedInput } from "./magnet-estimate-results";

/** The page opens on worked check 7 of the engineering brief: N42 (Br 1.30 T mid-range), l_m 4 mm, g 1 mm. */
export const startingMagnetInput: EstimatedInput = {
  grade: "N42",
  shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 4 },
  count: 1,
  temperatureC: 20,
  br20T: null,
  magnetLengthMm: 4,
  airGapMm: 1,
  demagnetisingFieldKAm: null,
};

/** The form's starting text for an input: Conform fills inputs from strings. */
export function magnetFormValues(input: EstimatedInput) {
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
    demagnetisingFieldKAm: text(input.demagnetisingFieldKAm),
  };
}

/** The API request for a checked form: the grade by name, blanks as null. */
export function magnetRequestOf(value: MagnetEstimateRequest): EstimatedInput {
  return {
    grade: value.grade ?? "",
    shape: value.shape,
    count: value.count,
    temperatureC: value.temperatureC,
    br20T: value.br20T ?? null,
    magnetLengthMm: value.magnetLengthMm ?? null,
    airGapMm: value.airGapMm ?? null,
    demagnetisingFieldKAm: value.demagnetisingFieldKAm ?? null,
  };
}

/** "Waiting for a valid height, air gap. …": the refused fields by their labels (else their names). */
export function waitingForText(
  fieldNames: string[],
  labels: Record<string, string>,
): string {
  return `Waiting for a valid ${fieldNames.map((name) => labels[name] ?? name).join(", ")}. The figures below are for the last complete input.`;
}

/** The API's messages for fields the form does not show (they go in the refusal's own line). */
export function messagesOfOtherFields(
  apiErrors: Record<string, string[]>,
  labels: Record<string, string>,
): string[] {
  const fieldNames = new Set(Object.keys(labels));
  return Object.entries(apiErrors)
    .filter(([name]) => !fieldNames.has(name))
    .flatMap(([, messages]) => messages);
}
