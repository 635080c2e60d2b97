/**
 * Request ids: the id each answer carries in `X-Request-Id`, on every log
 * line of its request and on the error pages ("Reference: …") so a person can
 * quote it. See docs/decisions/024-structured-logs.md.
 */
import { randomBytes } from "node:crypto";

/** Ids a proxy may hand us: 1–64 letters, digits and dashes (a UUID, nginx's $request_id). */
const acceptedShape = /^[A-Za-z0-9-]{1,64}$/;

/**
 * The incoming `X-Request-Id` to keep, or null for a fresh one. Kept only
 * behind a proxy we trust (TRUST_PROXY), which sets or overwrites the header,
 * and only in the shape above: an id a stranger chose could pose as another
 * request's reference or carry text into the log.
 */
export function acceptedRequestId(
  incoming: string | undefined,
  behindTrustedProxy: boolean,
): string | null {
  if (!behindTrustedProxy || incoming === undefined) return null;
  return acceptedShape.test(incoming) ? incoming : null;
}

/** A fresh id: 16 hex digits (64 random bits), short enough to read out on the phone. */
export function newRequestId(): string {
  return randomBytes(8).toString("hex");
}
