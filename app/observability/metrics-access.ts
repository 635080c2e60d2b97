/**
 * Who may read GET /metrics (docs/decisions/025-metrics.md): a scraper on
 * this machine, or anyone presenting METRICS_TOKEN as a bearer token.
 */
import { createHash, timingSafeEqual } from "node:crypto";

/** Whether a socket's remote address is this machine (127.0.0.0/8 or ::1, IPv4-mapped too). */
export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const v4 = address.startsWith("::ffff:") ? address.slice(7) : address;
  return v4.startsWith("127.") || address === "::1";
}

function digest(value: string): Buffer {
  return createHash("sha256").update(value).digest();
}

/** Compares two secrets in time that does not depend on where they differ (equal-length digests). */
export function sameSecret(given: string, expected: string): boolean {
  return timingSafeEqual(digest(given), digest(expected));
}

export interface MetricsRequest {
  /** The TCP peer (`socket.remoteAddress`), never X-Forwarded-For. */
  remoteAddress: string | undefined;
  /** Whether the request carries X-Forwarded-For or Forwarded: it came through a proxy. */
  forwarded: boolean;
  authorization: string | undefined;
  /**
   * Whether TRUST_PROXY says a proxy stands in front: then every request may
   * have come through it, with or without forwarding headers, and loopback
   * proves nothing.
   */
  behindProxy: boolean;
}

/**
 * Whether the request may read the metrics. From loopback only when no proxy
 * forwarded it: a reverse proxy on the same machine connects from loopback
 * on behalf of anyone on the internet. With METRICS_TOKEN set, a matching
 * `Authorization: Bearer` header lets a scraper elsewhere in. Behind a proxy
 * (TRUST_PROXY set) only the token does: a proxy that adds no forwarding
 * headers would otherwise open /metrics to whoever reaches it.
 */
export function mayReadMetrics(
  request: MetricsRequest,
  metricsToken: string | undefined,
): boolean {
  if (
    isLoopbackAddress(request.remoteAddress) &&
    !request.forwarded &&
    !request.behindProxy
  )
    return true;
  if (!metricsToken) return false;
  const match = request.authorization?.match(/^Bearer\s+(\S+)$/i);
  return !!match?.[1] && sameSecret(match[1], metricsToken);
}
