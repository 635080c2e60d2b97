import { getSessionState } from "./session.server";

/** Headers to send with a page's data: the refreshed session cookie, when lucia extended it. */
export async function sessionHeaders(request: Request): Promise<HeadersInit> {
  const { setCookie } = await getSessionState(request);
  return setCookie ? { "Set-Cookie": setCookie } : {};
}
