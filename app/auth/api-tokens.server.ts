/** Personal API tokens: created by their owner, shown once, stored hashed, revocable. */
import { randomBytes } from "node:crypto";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db, type Transaction } from "~/db/client.server";
import { retryWriteConflicts } from "~/db/write-transaction.server";
import { areaLogger } from "~/observability/logger.server";
import { apiTokens, userRoles, users } from "~/db/schema";
import { isRole, type Role } from "~/lib/roles";
import { hashToken } from "./email-tokens.server";
import type { SessionUser } from "./session.server";

const tokenPrefix = "tl_";
/** last_used_at is written at most this often per token, to keep reads read-only. */
const lastUsedResolutionMs = 60_000;

function parseRoles(value: string): Role[] {
  return value.split(",").filter(isRole);
}

/** The roles column's value for a token that follows its owner's roles. */
export const followsOwnerRoles = "*";

/** Creates a token acting with `roles` (must be the owner's), or with the owner's roles at each use when null. */
export async function createApiToken(input: {
  userId: string;
  name: string;
  roles: Role[] | null;
  expiresAt: Date | null;
}): Promise<{ token: string; id: number }> {
  const token = `${tokenPrefix}${randomBytes(32).toString("base64url")}`;
  const [inserted] = await db
    .insert(apiTokens)
    .values({
      userId: input.userId,
      name: input.name,
      tokenHash: hashToken(token),
      tokenPrefix: token.slice(0, 10),
      roles: input.roles === null ? followsOwnerRoles : input.roles.join(","),
      expiresAt: input.expiresAt,
    })
    .$returningId();
  if (!inserted) throw new Error("The new token's id was not returned.");
  return { token, id: inserted.id };
}

export async function listApiTokens(userId: string) {
  const rows = await db
    .select({
      id: apiTokens.id,
      name: apiTokens.name,
      tokenPrefix: apiTokens.tokenPrefix,
      roles: apiTokens.roles,
      createdAt: apiTokens.createdAt,
      expiresAt: apiTokens.expiresAt,
      lastUsedAt: apiTokens.lastUsedAt,
      revokedAt: apiTokens.revokedAt,
    })
    .from(apiTokens)
    .where(eq(apiTokens.userId, userId))
    .orderBy(desc(apiTokens.createdAt))
    .limit(200);
  return rows.map((row) => ({
    ...row,
    followsOwner: row.roles === followsOwnerRoles,
    roles: parseRoles(row.roles),
  }));
}

/** Revokes one of the owner's tokens. Returns false when there is no such live token. */
export async function revokeApiToken(
  userId: string,
  tokenId: number,
): Promise<boolean> {
  const [result] = await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(apiTokens.id, tokenId),
        eq(apiTokens.userId, userId),
        isNull(apiTokens.revokedAt),
      ),
    );
  return result.affectedRows === 1;
}

/**
 * Revokes every live token of the person: a password reset, deactivation or a
 * change of roles ends what the person's tokens could do (docs/decisions/017).
 * Revoked, not suspended: reactivation does not bring them back.
 */
export async function revokeAllApiTokens(
  tx: Transaction,
  userId: string,
): Promise<void> {
  await tx
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt)));
}

/** A token by its hash, with its owner and the owner's roles: built once, sent by every bearer request. */
const tokenAndOwner = db
  .select({
    id: apiTokens.id,
    roles: apiTokens.roles,
    expiresAt: apiTokens.expiresAt,
    revokedAt: apiTokens.revokedAt,
    lastUsedAt: apiTokens.lastUsedAt,
    userId: users.id,
    email: users.email,
    name: users.name,
    active: users.active,
    role: userRoles.role,
  })
  .from(apiTokens)
  .innerJoin(users, eq(users.id, apiTokens.userId))
  .leftJoin(userRoles, eq(userRoles.userId, users.id))
  .where(eq(apiTokens.tokenHash, sql.placeholder("tokenHash")))
  .prepare();

/**
 * The person a bearer token acts for, with the token's roles cut down to the
 * roles the owner holds now; null for an unknown, revoked or expired token or
 * a deactivated owner.
 */
export async function userFromApiToken(
  token: string,
): Promise<SessionUser | null> {
  if (!token.startsWith(tokenPrefix)) return null;
  // The token with its owner and the owner's roles in one statement: one row per role
  // (an owner without roles gives one row with a null role), as the session's read does.
  const rows = await tokenAndOwner.execute({ tokenHash: hashToken(token) });
  const [row] = rows;
  if (!row || row.revokedAt || !row.active) return null;
  const now = Date.now();
  if (row.expiresAt && row.expiresAt.getTime() <= now) return null;

  const held = new Set(
    rows.flatMap((each): Role[] => (each.role === null ? [] : [each.role])),
  );
  if (
    !row.lastUsedAt ||
    now - row.lastUsedAt.getTime() > lastUsedResolutionMs
  ) {
    // Only a note for the token list: a conflict that outlasts the retries
    // is logged, and the request goes on.
    await retryWriteConflicts(
      () =>
        db
          .update(apiTokens)
          .set({ lastUsedAt: new Date(now) })
          .where(eq(apiTokens.id, row.id)),
      { label: "token last use" },
    ).catch((error: unknown) =>
      areaLogger("auth").warn(
        { err: error },
        "the API token's last use was not recorded",
      ),
    );
  }
  return {
    id: row.userId,
    email: row.email,
    name: row.name,
    roles:
      row.roles === followsOwnerRoles
        ? [...held]
        : parseRoles(row.roles).filter((role) => held.has(role)),
    // The API answers in machine-neutral form whatever the owner reads pages in.
    locale: null,
    timeZone: null,
  };
}
