import { z } from "zod";
import { passwordMinimum } from "./password-minimum";

/** Form and API schemas for accounts, shared by browser and server. */

export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .max(254, "An e-mail address has at most 254 characters.")
  .pipe(z.email({ error: "Enter a valid e-mail address." }));

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).max(1000),
  redirectTo: z.string().optional(),
});

/** The body of POST /api/v1/sessions: signing in from a script. */
export const sessionCredentialsSchema = z.object({
  email: emailField,
  password: z
    .string({ error: "Enter your password." })
    .min(1, "Enter your password.")
    .max(1000),
});

export { passwordMinimum } from "./password-minimum";

/** A new password and its confirmation: the one rule for every way of choosing one. */
const chosenPasswordFields = {
  password: z
    .string({ error: "Choose a password." })
    .min(passwordMinimum, `Use at least ${passwordMinimum} characters.`)
    .max(200, "Use at most 200 characters."),
  confirmPassword: z.string({ error: "Type the password again." }),
};

const confirmationMatches = (value: {
  password: string;
  confirmPassword: string;
}) => value.password === value.confirmPassword;
const confirmationDiffers = {
  path: ["confirmPassword"],
  message: "The two passwords differ.",
};

export const newPasswordSchema = z
  .object({
    token: z.string({ error: "The link is incomplete." }),
    ...chosenPasswordFields,
  })
  .refine(confirmationMatches, confirmationDiffers);

/** Changing one's own password on the account page. */
export const changePasswordSchema = z
  .object({
    currentPassword: z
      .string({ error: "Enter your current password." })
      .min(1, "Enter your current password.")
      .max(1000),
    ...chosenPasswordFields,
  })
  .refine(confirmationMatches, confirmationDiffers)
  .refine((value) => value.password !== value.currentPassword, {
    path: ["password"],
    message: "Choose a password other than the one you have now.",
  });

export const forgotPasswordSchema = z.object({ email: emailField });

/**
 * Stands in for the app's own origin when a redirect target is resolved: the
 * answer is only ever a path, so which host the app really has does not matter.
 */
const ownOrigin = "http://turnledger.invalid";

/**
 * Only same-site paths may be redirected to after sign-in. The value is
 * resolved as a browser would (tabs and newlines dropped, backslashes read as
 * slashes, dot segments collapsed) and kept only when it stays on our origin;
 * the path is sent back re-written, never as it came in.
 */
export function safeRedirectPath(value: string | null | undefined): string {
  if (!value) return "/";
  let resolved: URL;
  try {
    resolved = new URL(value, ownOrigin);
  } catch {
    return "/";
  }
  // "//host" as a path would be read as another host by the browser.
  if (resolved.origin !== ownOrigin || resolved.pathname.startsWith("//"))
    return "/";
  return `${resolved.pathname}${resolved.search}${resolved.hash}`;
}

/** The one answer to a failed sign-in, whatever the cause (no account enumeration). */
export const wrongCredentialsMessage = "E-mail or password is wrong.";

/** "3 minutes": a wait in whole minutes, at least one. */
export function minutesText(seconds: number): string {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}

/** What a person is told when the sign-in throttle refuses to check a password (docs/decisions/017). */
export function signInPausedMessage(
  scope: "account" | "address",
  retryAfterSeconds: number,
): string {
  const wait = minutesText(retryAfterSeconds);
  return scope === "account"
    ? `Too many wrong passwords for this account: sign-in to it is paused for ${wait}. If they were not yours, choose a new password through “Forgotten your password?”; that ends the pause at once.`
    : `Too many failed sign-ins from your network address: sign-in from it is paused for ${wait}.`;
}

/** What a person is told when too many password checks are under way to take theirs (answered 503). */
export const passwordWorkBusyMessage =
  "The server is busy checking passwords. Try again in a few seconds.";

/** The answer to a sign-in that was refused before its password was checked. */
export function signInRefusal(
  result:
    | {
        kind: "paused";
        scope: "account" | "address";
        retryAfterSeconds: number;
      }
    | { kind: "busy"; retryAfterSeconds: number },
): { status: 429 | 503; message: string; headers: Record<string, string> } {
  return {
    status: result.kind === "paused" ? 429 : 503,
    message:
      result.kind === "paused"
        ? signInPausedMessage(result.scope, result.retryAfterSeconds)
        : passwordWorkBusyMessage,
    headers: { "Retry-After": String(result.retryAfterSeconds) },
  };
}
