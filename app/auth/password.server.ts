import { hash, verify } from "@node-rs/argon2";

// argon2id (the package's default algorithm) with the parameters OWASP's
// Password Storage Cheat Sheet lists first: 19 MiB memory, 2 passes, 1 lane.
const argon2Options = {
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
};

export function hashPassword(password: string): Promise<string> {
  return hash(password, argon2Options);
}

export async function verifyPassword(
  passwordHash: string,
  password: string,
): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash that matches no password: verified against when the e-mail is unknown,
 * so a wrong e-mail takes as long as a wrong password. */
let decoyHash: Promise<string> | undefined;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= hashPassword(`decoy-${Math.random()}`);
  return decoyHash;
}
