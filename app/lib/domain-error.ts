/**
 * A request the domain refuses, in any folder (the stock ledger, designs, suppliers, …):
 * 400 (bad input), 404 (unknown thing), 409 (not enough stock, conflicts, the wrong status)
 * or 422 (a well-formed request naming something that cannot be used: an unknown SKU in a
 * purchase order's lines, a supplier without an order address). API routes
 * answer it as JSON through `answerDomainError` (`app/lib/api-errors.server.ts`).
 */
export class DomainError extends Error {
  constructor(
    readonly status: 400 | 404 | 409 | 422,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = "DomainError";
  }
}

export function isDomainError(error: unknown): error is DomainError {
  return error instanceof DomainError;
}
