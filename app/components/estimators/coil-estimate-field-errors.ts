import type { ApiAnswer } from "~/lib/api-request";
import { formFieldOfApiField } from "~/lib/coil-estimator-fields";

/**
 * The API's field messages of a refused coil estimate, by the form field they belong
 * beside ("wire.size" → "awgSize"); none for an estimate or no answer yet.
 */
export function coilFormFieldErrors(
  answer: ApiAnswer<unknown> | undefined,
): Record<string, string[]> {
  const errors: Record<string, string[]> = {};
  if (answer && !answer.ok) {
    for (const [apiField, messages] of Object.entries(answer.fields)) {
      errors[formFieldOfApiField(apiField)] = messages;
    }
  }
  return errors;
}
