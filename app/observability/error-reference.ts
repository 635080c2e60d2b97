/** What a person reads when the server failed them, and the reference to quote (the request id). */
export const unexpectedErrorMessage =
  "The server could not answer this request. It has been logged; try again, and tell an admin the reference below if it keeps happening.";

/** The plain-text 500 page of an answer that failed before any page could be drawn. */
export function unexpectedErrorText(requestId: string | undefined): string {
  return `${unexpectedErrorMessage}\nReference: ${requestId ?? "none"}\n`;
}

/** The reference a route error's data carries (server/unexpected-errors.ts), or null. */
export function referenceOf(data: unknown): string | null {
  if (data && typeof data === "object" && "reference" in data) {
    const reference = (data as { reference: unknown }).reference;
    return typeof reference === "string" && reference ? reference : null;
  }
  return null;
}
