/**
 * Changing one's own password while signed in (the account page). The current
 * password is checked by the sign-in check itself, so a wrong one counts
 * against the account's sign-in throttle like a wrong sign-in
 * (docs/decisions/017). A new password ends what the old one could have
 * opened: every session (this one is issued afresh), every unused e-mailed
 * link and every API token, as a reset does.
 */
import { eq } from "drizzle-orm";
import { revokeAllApiTokens } from "~/auth/api-tokens.server";
import { endUnusedEmailTokens } from "~/auth/email-tokens.server";
import {
  hashPassword,
  isPasswordWorkBusy,
  passwordWorkRetryAfterSeconds,
} from "~/auth/password.server";
import { endAllSessions, startSession } from "~/auth/session.server";
import { writeTransaction } from "~/db/write-transaction.server";
import { users } from "~/db/schema";
import {
  checkSignIn,
  type PasswordWorkBusy,
  type SignInResult,
} from "./people.server";

export type PasswordChange =
  | { kind: "changed"; setCookie: string }
  | { kind: "wrong-current-password" }
  | Extract<SignInResult, { kind: "paused" }>
  | PasswordWorkBusy;

export async function changeOwnPassword(input: {
  user: { id: string; email: string };
  currentPassword: string;
  newPassword: string;
  clientAddress: string;
}): Promise<PasswordChange> {
  const check = await checkSignIn(
    input.user.email,
    input.currentPassword,
    input.clientAddress,
  );
  if (check.kind === "wrong-credentials")
    return { kind: "wrong-current-password" };
  if (check.kind !== "signed-in") return check;
  if (check.userId !== input.user.id)
    throw new Error("The signed-in person and the checked account differ.");

  let passwordHash: string;
  try {
    passwordHash = await hashPassword(input.newPassword);
  } catch (error) {
    if (isPasswordWorkBusy(error))
      return { kind: "busy", retryAfterSeconds: passwordWorkRetryAfterSeconds };
    throw error;
  }
  const userId = input.user.id;
  await writeTransaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
    await endUnusedEmailTokens(tx, userId);
    await revokeAllApiTokens(tx, userId);
  });
  await endAllSessions(userId);
  return { kind: "changed", setCookie: await startSession(userId) };
}
