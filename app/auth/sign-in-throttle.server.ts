/**
 * The sign-in throttle (docs/decisions/017). Every password check is a guess
 * reserved before the password is looked at, counted twice:
 *
 * - per account (the e-mail, whether or not it has an account): 5 failed
 *   guesses in 15 minutes pause sign-in to it for the rest of those 15
 *   minutes, from anywhere. The person is told so, and setting a new password
 *   from an e-mailed link ends the pause at once, so nobody can keep a person
 *   out by guessing wrong for them.
 * - per client address (IPv6 by its /64): 100 failed guesses in 15 minutes, on
 *   any accounts, pause sign-in from that address for the rest of the window.
 *
 * Only failures count: a right password takes its guess back from the
 * address and clears the account's count; a guess refused unchecked (paused,
 * or the server too busy to check) counts for nothing.
 */
import { addressGroup } from "./address-group";
import {
  clearAttempts,
  countAttempts,
  releaseAttempts,
  type AttemptLimit,
  type CountedAttempt,
} from "./attempt-counters.server";

const fifteenMinutes = 15 * 60 * 1000;

export const signInLimits = {
  account: { rule: "sign-in-account", limit: 5, windowMs: fifteenMinutes },
  address: { rule: "sign-in-address", limit: 100, windowMs: fifteenMinutes },
} as const satisfies Record<string, AttemptLimit>;

export type SignInPause = {
  kind: "paused";
  /** What is paused: sign-in to this account, or from this client address. */
  scope: "account" | "address";
  retryAfterSeconds: number;
};

export type SignInGuess =
  { kind: "granted"; counted: CountedAttempt[] } | SignInPause;

/** Reserves one password check of the (normalised) e-mail from the client address. */
export async function reserveSignInGuess(
  email: string,
  clientAddress: string,
): Promise<SignInGuess> {
  const { counted, over } = await countAttempts([
    { limit: signInLimits.account, subject: email },
    { limit: signInLimits.address, subject: addressGroup(clientAddress) },
  ]);
  if (!over) return { kind: "granted", counted };
  await releaseAttempts(counted);
  return {
    kind: "paused",
    scope: over.rule === signInLimits.account.rule ? "account" : "address",
    retryAfterSeconds: over.retryAfterSeconds,
  };
}

/** The password was not checked after all (the server was too busy): the guess counts for nothing. */
export function cancelSignInGuess(
  guess: Extract<SignInGuess, { kind: "granted" }>,
): Promise<void> {
  return releaseAttempts(guess.counted);
}

/** The password was right: the guess is taken back from the address, and the account's failures are forgotten. */
export async function signInSucceeded(
  guess: Extract<SignInGuess, { kind: "granted" }>,
): Promise<void> {
  const [account, address] = guess.counted;
  if (account) await clearAttempts(account.rule, account.subject);
  if (address) await releaseAttempts([address]);
}

/** Ends a pause on the account (a new password was set from an e-mailed link). */
export function endSignInPause(email: string): Promise<void> {
  return clearAttempts(signInLimits.account.rule, email);
}
