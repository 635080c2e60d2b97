/**
 * Limits on asking for password-reset links (docs/decisions/017): 3 an hour
 * per e-mail asked for (whether or not it has an account, so a refusal tells
 * nothing), and 50 an hour per client address (IPv6 by its /64). Every
 * request counts, answered or refused.
 */
import { addressGroup } from "./address-group";
import { countAttempts, type AttemptLimit } from "./attempt-counters.server";

const oneHour = 60 * 60 * 1000;

export const resetRequestLimits = {
  account: { rule: "reset-account", limit: 3, windowMs: oneHour },
  address: { rule: "reset-address", limit: 50, windowMs: oneHour },
} as const satisfies Record<string, AttemptLimit>;

export type ResetRequestRefusal = {
  kind: "limited";
  /** Too many for this e-mail, or from this client address. */
  scope: "account" | "address";
  retryAfterSeconds: number;
};

/** Counts a request for a link to the (normalised) e-mail; the refusal when it is one too many. */
export async function countResetRequest(
  email: string,
  clientAddress: string,
): Promise<ResetRequestRefusal | null> {
  const { over } = await countAttempts([
    { limit: resetRequestLimits.account, subject: email },
    { limit: resetRequestLimits.address, subject: addressGroup(clientAddress) },
  ]);
  if (!over) return null;
  return {
    kind: "limited",
    scope:
      over.rule === resetRequestLimits.account.rule ? "account" : "address",
    retryAfterSeconds: over.retryAfterSeconds,
  };
}
