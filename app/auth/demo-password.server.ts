/**
 * The demo accounts' password. It is published (README, seed), so no real
 * account may take it as a new password, and a production server can look
 * for accounts that still have it.
 */
export const defaultDemoPassword = "turnledger-demo";

/** DEMO_PASSWORD, or the published default when it is not set. */
export function demoPassword(): string {
  return process.env.DEMO_PASSWORD || defaultDemoPassword;
}

/** True for the published default and for this installation's DEMO_PASSWORD. */
export function isPublishedDemoPassword(password: string): boolean {
  return password === defaultDemoPassword || password === demoPassword();
}

export const publishedDemoPasswordMessage =
  "This password is published with the Turnledger demo; choose another.";
