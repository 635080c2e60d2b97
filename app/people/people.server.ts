/** People and their accounts: sign-in, invitations, roles, deactivation, passwords. */
import { randomBytes } from "node:crypto";
import {
  and,
  asc,
  count,
  eq,
  inArray,
  isNull,
  like,
  or,
  sql,
} from "drizzle-orm";
import { db } from "~/db/client.server";
import { containsPattern } from "~/lib/list-filters";
import { writeTransaction } from "~/db/write-transaction.server";
import { emailTokens, userRoles, users } from "~/db/schema";
import { revokeAllApiTokens } from "~/auth/api-tokens.server";
import {
  createEmailToken,
  endUnusedEmailTokens,
  findUsableToken,
  hashToken,
} from "~/auth/email-tokens.server";
import {
  decoyPasswordHash,
  hashPassword,
  isPasswordWorkBusy,
  passwordWorkRetryAfterSeconds,
  verifyPassword,
} from "~/auth/password.server";
import {
  countResetRequest,
  type ResetRequestRefusal,
} from "~/auth/reset-request-limit.server";
import { endAllSessions } from "~/auth/session.server";
import {
  cancelSignInGuess,
  endSignInPause,
  reserveSignInGuess,
  signInSucceeded,
  type SignInPause,
} from "~/auth/sign-in-throttle.server";
import {
  invitationMessage,
  passwordResetMessage,
} from "~/mail/account-messages";
import {
  afterTheAnswer,
  queueMailForLater,
  sendMail,
} from "~/mail/mailer.server";
import type { Role } from "~/lib/roles";

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function newUserId(): string {
  return randomBytes(15).toString("base64url");
}

/** The password checks were too busy to take this one: try again after a moment (answer 503). */
export type PasswordWorkBusy = { kind: "busy"; retryAfterSeconds: number };

export type SignInResult =
  | { kind: "signed-in"; userId: string }
  | { kind: "wrong-credentials" }
  | SignInPause
  | PasswordWorkBusy;

const passwordWorkBusy: PasswordWorkBusy = {
  kind: "busy",
  retryAfterSeconds: passwordWorkRetryAfterSeconds,
};

/**
 * Checks an e-mail and password under the sign-in throttle (signing in, and
 * confirming the password again before an API token is made). Unknown e-mail,
 * wrong password, no password yet and deactivated account all answer the
 * same "wrong-credentials".
 */
export async function checkSignIn(
  emailInput: string,
  password: string,
  clientAddress: string,
): Promise<SignInResult> {
  const email = normaliseEmail(emailInput);
  const guess = await reserveSignInGuess(email, clientAddress);
  if (guess.kind === "paused") return guess;

  const [user] = await db
    .select({
      id: users.id,
      passwordHash: users.passwordHash,
      active: users.active,
    })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  let passwordMatches: boolean;
  try {
    passwordMatches = await verifyPassword(
      user?.passwordHash ?? (await decoyPasswordHash()),
      password,
    );
  } catch (error) {
    if (!isPasswordWorkBusy(error)) throw error;
    await cancelSignInGuess(guess);
    return passwordWorkBusy;
  }
  // A failure keeps its reserved guess: that is what the throttle counts.
  if (!user || !user.passwordHash || !user.active || !passwordMatches)
    return { kind: "wrong-credentials" };
  await signInSucceeded(guess);
  return { kind: "signed-in", userId: user.id };
}

export const peoplePageSize = 50;

/** One page of people, by name, with their roles; and how many there are in all. */
/** One page of people by name; with a search, those whose name or e-mail holds it; with a role, those holding it. */
export async function listPeople(
  page: number,
  filter: { search?: string; role?: Role } = {},
) {
  const where = and(
    filter.search
      ? or(
          like(users.name, containsPattern(filter.search)),
          like(users.email, containsPattern(filter.search)),
        )
      : undefined,
    filter.role
      ? inArray(
          users.id,
          db
            .select({ id: userRoles.userId })
            .from(userRoles)
            .where(eq(userRoles.role, filter.role)),
        )
      : undefined,
  );
  const [total] = await db.select({ people: count() }).from(users).where(where);
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      active: users.active,
      hasPassword: sql<number>`${users.passwordHash} IS NOT NULL`,
      createdAt: users.createdAt,
      roles: sql<
        string | null
      >`GROUP_CONCAT(${userRoles.role} ORDER BY ${userRoles.role})`,
    })
    .from(users)
    .leftJoin(userRoles, eq(userRoles.userId, users.id))
    .where(where)
    .groupBy(users.id)
    .orderBy(asc(users.name), asc(users.id))
    .limit(peoplePageSize)
    .offset((page - 1) * peoplePageSize);
  return {
    total: total?.people ?? 0,
    people: rows.map((row) => ({
      ...row,
      hasPassword: Boolean(Number(row.hasPassword)),
      roles: (row.roles ? row.roles.split(",") : []) as Role[],
    })),
  };
}

export async function findPerson(userId: string) {
  const [user] = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      active: users.active,
    })
    .from(users)
    .where(eq(users.id, userId))
    .limit(1);
  if (!user) return null;
  const roleRows = await db
    .select({ role: userRoles.role })
    .from(userRoles)
    .where(eq(userRoles.userId, userId));
  return { ...user, roles: roleRows.map((row) => row.role) };
}

export async function emailIsTaken(email: string): Promise<boolean> {
  const [row] = await db
    .select({ taken: count() })
    .from(users)
    .where(eq(users.email, normaliseEmail(email)));
  return (row?.taken ?? 0) > 0;
}

/** Creates the account without a password and e-mails a single-use link to set one. */
export async function invitePerson(input: {
  email: string;
  name: string;
  roles: Role[];
  invitedBy: string;
  appUrl: string;
}): Promise<{ userId: string; mailSent: boolean }> {
  const userId = newUserId();
  await writeTransaction(async (tx) => {
    await tx.insert(users).values({
      id: userId,
      email: normaliseEmail(input.email),
      name: input.name.trim(),
      passwordHash: null,
    });
    await tx
      .insert(userRoles)
      .values(input.roles.map((role) => ({ userId, role })));
  });
  const token = await createEmailToken(userId, "invitation");
  const message = invitationMessage({
    name: input.name.trim(),
    invitedBy: input.invitedBy,
    link: `${input.appUrl}/set-password?token=${token}`,
  });
  const mailSent = await sendMail({
    to: normaliseEmail(input.email),
    ...message,
  });
  return { userId, mailSent };
}

/**
 * Replaces a person's roles in one transaction, revokes their API tokens and
 * ends their sessions: what they could do before must not outlive the change.
 */
export async function setRoles(userId: string, roles: Role[]): Promise<void> {
  await writeTransaction(async (tx) => {
    await tx.delete(userRoles).where(eq(userRoles.userId, userId));
    if (roles.length > 0) {
      await tx
        .insert(userRoles)
        .values(roles.map((role) => ({ userId, role })));
    }
    await revokeAllApiTokens(tx, userId);
  });
  await endAllSessions(userId);
}

export async function countActiveAdmins(): Promise<number> {
  const [row] = await db
    .select({ admins: count() })
    .from(users)
    .innerJoin(
      userRoles,
      and(eq(userRoles.userId, users.id), eq(userRoles.role, "admin")),
    )
    .where(eq(users.active, true));
  return row?.admins ?? 0;
}

/**
 * Deactivating ends every session of the person and revokes their API tokens
 * at once; reactivating lets them sign in again (with new tokens only).
 */
export async function setActive(
  userId: string,
  active: boolean,
): Promise<void> {
  await writeTransaction(async (tx) => {
    await tx.update(users).set({ active }).where(eq(users.id, userId));
    if (!active) await revokeAllApiTokens(tx, userId);
  });
  if (!active) await endAllSessions(userId);
}

export type PasswordResetRequest = { kind: "accepted" } | ResetRequestRefusal;

/**
 * Accepts a request for a reset link: limited per e-mail and per client
 * address, then answered at once. Whether the e-mail belongs to an active
 * account is looked up after the answer (with the link and the outbox row
 * made then), so the answer does the same work, and takes the same time,
 * for an account as for no account; earlier links stay valid.
 */
export async function requestPasswordReset(
  emailInput: string,
  clientAddress: string,
  appUrl: string,
): Promise<PasswordResetRequest> {
  const email = normaliseEmail(emailInput);
  const refusal = await countResetRequest(email, clientAddress);
  if (refusal) return refusal;
  afterTheAnswer(sendResetLinkIfAccount(email, appUrl));
  return { kind: "accepted" };
}

/** Queues a reset link when the e-mail belongs to an active account; nothing otherwise. */
async function sendResetLinkIfAccount(
  email: string,
  appUrl: string,
): Promise<void> {
  const [user] = await db
    .select({ id: users.id, name: users.name, active: users.active })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  if (!user?.active) return;
  const token = await createEmailToken(user.id, "password-reset");
  const message = passwordResetMessage({
    name: user.name,
    link: `${appUrl}/set-password?token=${token}`,
  });
  await queueMailForLater([{ to: email, ...message }]);
}

export type SetPasswordResult =
  { kind: "set"; userId: string } | { kind: "unusable" } | PasswordWorkBusy;

/**
 * Uses a link (once) to set a password. The link is looked up before the
 * password is hashed, so an unknown one costs a query, not argon2. Setting
 * the password ends the person's other links, sessions, API tokens and any
 * pause of sign-in to their account.
 */
export async function setPasswordWithToken(
  token: string,
  password: string,
): Promise<SetPasswordResult> {
  if (!(await findUsableToken(token))) return { kind: "unusable" };
  let passwordHash: string;
  try {
    passwordHash = await hashPassword(password);
  } catch (error) {
    if (isPasswordWorkBusy(error)) return passwordWorkBusy;
    throw error;
  }
  const owner = await writeTransaction(async (tx) => {
    const [row] = await tx
      .select({
        id: emailTokens.id,
        userId: emailTokens.userId,
        expiresAt: emailTokens.expiresAt,
      })
      .from(emailTokens)
      .where(
        and(
          eq(emailTokens.tokenHash, hashToken(token)),
          isNull(emailTokens.usedAt),
        ),
      )
      .for("update")
      .limit(1);
    if (!row || row.expiresAt.getTime() <= Date.now()) return null;
    const [person] = await tx
      .select({ email: users.email, active: users.active })
      .from(users)
      .where(eq(users.id, row.userId))
      .limit(1);
    if (!person?.active) return null;
    await endUnusedEmailTokens(tx, row.userId);
    await tx
      .update(users)
      .set({ passwordHash })
      .where(eq(users.id, row.userId));
    await revokeAllApiTokens(tx, row.userId);
    return { userId: row.userId, email: person.email };
  });
  if (!owner) return { kind: "unusable" };
  await endAllSessions(owner.userId);
  await endSignInPause(owner.email);
  return { kind: "set", userId: owner.userId };
}
