/** A build-order step the server refuses: bad input (400), no such order (404) or the state or stock forbids it (409). */

/** One item a reservation could not cover. Quantities in the item's unit. */
export interface Shortage {
  sku: string;
  /** Still to reserve for the line. */
  required: number;
  /** Free to reserve now (on hand − reserved). */
  available: number;
  short: number;
  unit: string;
}

export class BuildOrderError extends Error {
  constructor(
    readonly status: 400 | 404 | 409,
    message: string,
    readonly field?: string,
    readonly shortages?: Shortage[],
  ) {
    super(message);
    this.name = "BuildOrderError";
  }
}

export function isBuildOrderError(error: unknown): error is BuildOrderError {
  return error instanceof BuildOrderError;
}
