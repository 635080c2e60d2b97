/** A stock request the ledger refuses: 400 (bad input), 404 (unknown item) or 409 (not enough stock, conflicts). */
export class StockError extends Error {
  constructor(
    readonly status: 400 | 404 | 409,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = "StockError";
  }
}

export function isStockError(error: unknown): error is StockError {
  return error instanceof StockError;
}
