/**
 * A way in for an operator that is not a published password: the first admin
 * of a new database (or an admin locked out) gets a one-time link to choose a
 * password, printed by `npm run admin:create`, never e-mailed.
 */
import { eq } from "drizzle-orm";
import { createEmailToken } from "~/auth/email-tokens.server";
import { writeTransaction } from "~/db/write-transaction.server";
import { userRoles, users } from "~/db/schema";
import { appUrl } from "~/lib/app-url.server";
import { newUserId, normaliseEmail } from "./people.server";

export interface AdminAccess {
  /** True when a new account was made; false when an existing one was made admin. */
  created: boolean;
  /** The one-time link to choose a password, on APP_URL. */
  link: string;
  /** How long the link works, in words. */
  validFor: string;
}

/**
 * Makes `email` an active admin (creating the account when there is none) and
 * returns a single-use link to choose a password: an invitation for a new
 * account (7 days), a password reset for an existing one (30 minutes).
 */
export async function grantAdminAccess(input: {
  email: string;
  name?: string;
}): Promise<AdminAccess> {
  const email = normaliseEmail(input.email);
  const { userId, created } = await writeTransaction(async (tx) => {
    const [existing] = await tx
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, email))
      .for("update")
      .limit(1);
    const id = existing?.id ?? newUserId();
    if (existing) {
      await tx.update(users).set({ active: true }).where(eq(users.id, id));
    } else {
      await tx.insert(users).values({
        id,
        email,
        name: (input.name?.trim() || email.split("@")[0]!).slice(0, 120),
        passwordHash: null,
      });
    }
    await tx.insert(userRoles).ignore().values({ userId: id, role: "admin" });
    return { userId: id, created: !existing };
  });
  const purpose = created ? "invitation" : "password-reset";
  const token = await createEmailToken(userId, purpose);
  return {
    created,
    link: `${appUrl()}/set-password?token=${token}`,
    validFor: created ? "7 days" : "30 minutes",
  };
}
