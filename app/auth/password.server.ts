import { hash, verify } from "@node-rs/argon2";
import { createWorkQueue, WorkQueueFullError } from "./work-queue";

// argon2id (the package's default algorithm) with the parameters OWASP's
// Password Storage Cheat Sheet lists first: 19 MiB memory, 2 passes, 1 lane.
const argon2Options = {
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
};

/**
 * Every hash and verification of this process goes through one queue: two at
 * once (each takes tens of milliseconds and 19 MiB, on libuv's thread pool of
 * four, which compression and file reads share), 32 more waiting. A flood of
 * sign-ins is then answered "busy" at once instead of queueing without end
 * and holding memory (docs/decisions/017).
 */
const passwordWork = createWorkQueue({ concurrency: 2, maxWaiting: 32 });

/** Seconds a caller refused for a full queue is told to wait (Retry-After). */
export const passwordWorkRetryAfterSeconds = 2;

/** True for the error `hashPassword` and `verifyPassword` throw when the queue is full. */
export function isPasswordWorkBusy(error: unknown): boolean {
  return error instanceof WorkQueueFullError;
}

let hashesStarted = 0;
/** How many hashes this process has started: lets a test see that a refusal cost no hashing. */
export function passwordHashesStarted(): number {
  return hashesStarted;
}

/** Hashes a new password; throws (see `isPasswordWorkBusy`) when the queue is full. */
export function hashPassword(password: string): Promise<string> {
  return passwordWork.run(() => {
    hashesStarted += 1;
    return hash(password, argon2Options);
  });
}

/** Checks a password against its hash; throws (see `isPasswordWorkBusy`) when the queue is full. */
export function verifyPassword(
  passwordHash: string,
  password: string,
): Promise<boolean> {
  return passwordWork.run(async () => {
    try {
      return await verify(passwordHash, password);
    } catch {
      return false;
    }
  });
}

/** A hash that matches no password: verified against when the e-mail is unknown,
 * so a wrong e-mail takes as long as a wrong password. Made once per process,
 * outside the queue, so a busy moment at start cannot leave it broken. */
let decoyHash: Promise<string> | undefined;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= hash(`decoy-${Math.random()}`, argon2Options);
  return decoyHash;
}
