import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db, type Transaction } from "~/db/client.server";
import { writeTransaction } from "~/db/write-transaction.server";
import { emailTokens } from "~/db/schema";

export type EmailTokenPurpose = "invitation" | "password-reset";

export const tokenLifetimeMs: Record<EmailTokenPurpose, number> = {
  "password-reset": 30 * 60 * 1000,
  invitation: 7 * 24 * 60 * 60 * 1000,
};

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/**
 * Whether a new link of the purpose ends the person's earlier unused ones. An
 * admin sends a new invitation on purpose (the first went astray), so it
 * replaces the old; anyone can ask for a reset link for anyone, so asking must
 * not void the link the person holds. Either way, setting a password with one
 * link ends all the others (`endUnusedEmailTokens`).
 */
const newTokenEndsEarlier: Record<EmailTokenPurpose, boolean> = {
  invitation: true,
  "password-reset": false,
};

/** Creates a single-use token; only its hash is stored. */
export async function createEmailToken(
  userId: string,
  purpose: EmailTokenPurpose,
): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  const now = new Date();
  await writeTransaction(async (tx) => {
    if (newTokenEndsEarlier[purpose]) {
      await tx
        .update(emailTokens)
        .set({ usedAt: now })
        .where(
          and(
            eq(emailTokens.userId, userId),
            eq(emailTokens.purpose, purpose),
            isNull(emailTokens.usedAt),
          ),
        );
    }
    await tx.insert(emailTokens).values({
      userId,
      purpose,
      tokenHash: hashToken(token),
      expiresAt: new Date(now.getTime() + tokenLifetimeMs[purpose]),
    });
  });
  return token;
}

/** Ends every unused link of the person, of any purpose (a password has just been set). */
export async function endUnusedEmailTokens(
  tx: Transaction,
  userId: string,
): Promise<void> {
  await tx
    .update(emailTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(emailTokens.userId, userId), isNull(emailTokens.usedAt)));
}

/** The token's row when it is unused and unexpired, else null. Does not use it up. */
export async function findUsableToken(token: string) {
  const [row] = await db
    .select()
    .from(emailTokens)
    .where(
      and(
        eq(emailTokens.tokenHash, hashToken(token)),
        isNull(emailTokens.usedAt),
        gt(emailTokens.expiresAt, new Date()),
      ),
    )
    .limit(1);
  return row ?? null;
}
