/**
 * The browser's calls to our JSON API from a page's clientAction, made with the typed
 * client (~/api-client/client). Every outcome comes back as an answer to show (the data,
 * or a refusal with field messages), never as a thrown error: a thrown 400 would replace
 * the page with the error page.
 */
export type ApiAnswer<T> =
  | { ok: true; data: T }
  | {
      ok: false;
      status: number;
      message: string;
      fields: Record<string, string[]>;
    };

/** What a typed client call resolves to: the answer's data, or its error body. */
interface ClientResult<T> {
  data?: T;
  error?: unknown;
  response: Response;
}

function errorOf(
  body: unknown,
): { message?: string; fields?: Record<string, string[]> } | undefined {
  return body && typeof body === "object" && "error" in body
    ? (body.error as { message?: string; fields?: Record<string, string[]> })
    : undefined;
}

/** Awaits a typed client call (`apiClient.POST(…, { signal })`) and makes its outcome an answer. */
export async function apiAnswer<T>(
  call: Promise<ClientResult<T>>,
  signal: AbortSignal,
): Promise<ApiAnswer<T>> {
  let result: ClientResult<T>;
  try {
    result = await call;
  } catch (error) {
    if (signal.aborted) throw error; // a newer request replaced this one
    return {
      ok: false,
      status: 0,
      message:
        "Turnledger could not be reached. Check the connection; the figures update when you change a value.",
      fields: {},
    };
  }
  const { response } = result;
  if (response.ok && result.data !== undefined)
    return { ok: true, data: result.data };
  const error = errorOf(result.error);
  return {
    ok: false,
    status: response.status,
    message:
      response.status === 401
        ? "Your session has ended: sign in again to see the figures."
        : (error?.message ??
          `The request failed (status ${response.status}). Try again in a moment.`),
    fields: error?.fields ?? {},
  };
}
