/** The guard of the stocktake pages: signed in, and a starter, counter or reviewer of stocktakes. */
import { refuseUnless, requireUser } from "~/auth/guard.server";
import type { SessionUser } from "~/auth/session.server";
import { canReadStocktakes, stocktakeReadersMessage } from "./stocktake-access";

export async function requireStocktakeReader(
  request: Request,
): Promise<SessionUser> {
  const user = await requireUser(request);
  // Someone with none of the stocktake capabilities lacks this one too: the guard's own 403.
  if (!canReadStocktakes(user))
    refuseUnless(request, user, "approveStocktakes", stocktakeReadersMessage);
  return user;
}
