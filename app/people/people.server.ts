/** People and their accounts: sign-in, invitations, roles, deactivation, passwords. */
import { randomBytes } from "node:crypto";
import { and, asc, count, eq, isNull, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { emailTokens, userRoles, users } from "~/db/schema";
import { createEmailToken, hashToken } from "~/auth/email-tokens.server";
import {
  decoyPasswordHash,
  hashPassword,
  verifyPassword,
} from "~/auth/password.server";
import { endAllSessions } from "~/auth/session.server";
import {
  clearFailedSignIns,
  recordFailedSignIn,
  signInRetryAfterSeconds,
} from "~/auth/sign-in-throttle.server";
import {
  invitationMessage,
  passwordResetMessage,
} from "~/mail/account-messages";
import { sendMail } from "~/mail/mailer.server";
import type { Role } from "~/lib/roles";

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function newUserId(): string {
  return randomBytes(15).toString("base64url");
}

export type SignInResult =
  | { kind: "signed-in"; userId: string }
  | { kind: "wrong-credentials" }
  | { kind: "throttled"; retryAfterSeconds: number };

/**
 * Checks an e-mail and password. Unknown e-mail, wrong password, no password
 * yet and deactivated account all answer the same "wrong-credentials".
 */
export async function checkSignIn(
  emailInput: string,
  password: string,
  ipAddress: string,
): Promise<SignInResult> {
  const email = normaliseEmail(emailInput);
  const retryAfterSeconds = await signInRetryAfterSeconds(email, ipAddress);
  if (retryAfterSeconds > 0) return { kind: "throttled", retryAfterSeconds };

  const [user] = await db
    .select({
      id: users.id,
      passwordHash: users.passwordHash,
      active: users.active,
    })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  const passwordMatches = await verifyPassword(
    user?.passwordHash ?? (await decoyPasswordHash()),
    password,
  );
  if (!user || !user.passwordHash || !user.active || !passwordMatches) {
    await recordFailedSignIn(email, ipAddress);
    return { kind: "wrong-credentials" };
  }
  await clearFailedSignIns(email, ipAddress);
  return { kind: "signed-in", userId: user.id };
}

export const peoplePageSize = 50;

/** One page of people, by name, with their roles; and how many there are in all. */
export async function listPeople(page: number) {
  const [total] = await db.select({ people: count() }).from(users);
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
  await db.transaction(async (tx) => {
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

/** Replaces a person's roles in one transaction. */
export async function setRoles(userId: string, roles: Role[]): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.delete(userRoles).where(eq(userRoles.userId, userId));
    if (roles.length > 0) {
      await tx
        .insert(userRoles)
        .values(roles.map((role) => ({ userId, role })));
    }
  });
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

/** Deactivating ends every session of the person at once; reactivating lets them sign in again. */
export async function setActive(
  userId: string,
  active: boolean,
): Promise<void> {
  await db.update(users).set({ active }).where(eq(users.id, userId));
  if (!active) await endAllSessions(userId);
}

/** Sends a reset link when the e-mail belongs to an active account; silent otherwise. */
export async function requestPasswordReset(
  emailInput: string,
  appUrl: string,
): Promise<void> {
  const email = normaliseEmail(emailInput);
  const [user] = await db
    .select({ id: users.id, name: users.name, active: users.active })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  if (!user || !user.active) return;
  const token = await createEmailToken(user.id, "password-reset");
  const message = passwordResetMessage({
    name: user.name,
    link: `${appUrl}/set-password?token=${token}`,
  });
  await sendMail({ to: email, ...message });
}

/**
 * Uses a token (once) to set a password. Ends the person's other sessions.
 * Returns the user id, or null when the token is unknown, used or expired.
 */
export async function setPasswordWithToken(
  token: string,
  password: string,
): Promise<string | null> {
  const passwordHash = await hashPassword(password);
  const userId = await db.transaction(async (tx) => {
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
    const [owner] = await tx
      .select({ active: users.active })
      .from(users)
      .where(eq(users.id, row.userId))
      .limit(1);
    if (!owner?.active) return null;
    await tx
      .update(emailTokens)
      .set({ usedAt: new Date() })
      .where(eq(emailTokens.id, row.id));
    await tx
      .update(users)
      .set({ passwordHash })
      .where(eq(users.id, row.userId));
    return row.userId;
  });
  if (userId) await endAllSessions(userId);
  return userId;
}
