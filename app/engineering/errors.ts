/**
 * The one error the engineering calculations throw for input they cannot use
 * (an AWG size or IEC diameter that is not in the tables, an insulation that does
 * not belong to the wire's standard, a shape whose inner radius exceeds its outer).
 *
 * `field` is the path of the offending input as the API names it (for example
 * "wire.size" or "shape.innerRadiusMm"), so a route can answer 400 with a message
 * per field. `message` is written for the person who typed the value.
 */
export class EngineeringInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = "EngineeringInputError";
    this.field = field;
  }
}

/** True when `error` is an {@link EngineeringInputError} (also across bundles). */
export function isEngineeringInputError(
  error: unknown,
): error is EngineeringInputError {
  return (
    error instanceof EngineeringInputError ||
    (error instanceof Error &&
      error.name === "EngineeringInputError" &&
      typeof (error as { field?: unknown }).field === "string")
  );
}

/** Throws unless `value` is a finite number greater than zero. */
export function requirePositive(
  value: number,
  field: string,
  label: string,
): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new EngineeringInputError(
      field,
      `${label} must be a number greater than zero.`,
    );
  }
}

/** Throws unless `value` is a finite number of zero or more. */
export function requireNonNegative(
  value: number,
  field: string,
  label: string,
): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new EngineeringInputError(
      field,
      `${label} must be a number of zero or more.`,
    );
  }
}

/** Throws unless `value` is a finite number (not NaN, not ±Infinity). */
export function requireFinite(
  value: number,
  field: string,
  label: string,
): void {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new EngineeringInputError(field, `${label} must be a number.`);
  }
}

/** Throws unless `value` is a whole number of at least `min` (default 1). */
export function requireWholeNumber(
  value: number,
  field: string,
  label: string,
  min = 1,
): void {
  if (!Number.isInteger(value) || value < min) {
    throw new EngineeringInputError(
      field,
      `${label} must be a whole number, at least ${min}.`,
    );
  }
}

/** Throws unless `value` is a finite number from `min` to `max` inclusive; `unit` follows each bound. */
export function requireWithin(
  value: number,
  field: string,
  label: string,
  min: number,
  max: number,
  unit = "",
): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    const suffix = unit ? ` ${unit}` : "";
    const text = (bound: number) =>
      `${String(bound).replace("-", "−")}${suffix}`;
    throw new EngineeringInputError(
      field,
      `${label} must be a number from ${text(min)} to ${text(max)}.`,
    );
  }
}
