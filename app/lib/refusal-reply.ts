/**
 * The form answer for a refused action (a DomainError caught in a route's action): the
 * message under the field it concerns, or above the form when it concerns no single field.
 */

interface Replying<Result> {
  reply(options: {
    fieldErrors?: Record<string, string[]>;
    formErrors?: string[];
  }): Result;
}

/** `submission.reply` with `message` under `field`, or as a form error when `field` is empty. */
export function refusalReply<Result>(
  submission: Replying<Result>,
  field: string | null | undefined,
  message: string,
): Result {
  return field
    ? submission.reply({ fieldErrors: { [field]: [message] } })
    : submission.reply({ formErrors: [message] });
}
