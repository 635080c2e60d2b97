/**
 * The browser's calls to our JSON API from a page's clientAction. Every
 * outcome comes back as an answer to show (the data, or a refusal with field
 * messages), never as a thrown error: a thrown 400 would replace the page
 * with the error page.
 */
export type ApiAnswer<T> =
  | { ok: true; data: T }
  | {
      ok: false;
      status: number;
      message: string;
      fields: Record<string, string[]>;
    };

export async function postJson<T>(
  path: string,
  body: unknown,
  signal: AbortSignal,
): Promise<ApiAnswer<T>> {
  let response: Response;
  try {
    response = await fetch(path, {
      method: "POST",
      headers: {
        "Content-Type": "application/json",
        Accept: "application/json",
      },
      body: JSON.stringify(body),
      signal,
    });
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
  const parsed = (await response.json().catch(() => null)) as
    | T
    | { error?: { message?: string; fields?: Record<string, string[]> } }
    | null;
  if (response.ok && parsed !== null) return { ok: true, data: parsed as T };
  const error =
    parsed && typeof parsed === "object" && "error" in parsed
      ? parsed.error
      : undefined;
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
