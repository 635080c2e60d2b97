import { data, redirect } from "react-router";
import type { Route } from "./+types/scan";
import { requireUser } from "~/auth/guard.server";
import { userCan } from "~/lib/capabilities";
import { lookUpScannedText, ownOrigins } from "~/labels/scan-lookup.server";
import { recordPageWithLocation } from "~/labels/scan-targets";

/**
 * Where a label's QR code leads (a phone's camera opens `/scan/L123`): a lot's page, or
 * for a location the record page with that location chosen (the stock list has no
 * location filter; the stock list for those who record nothing). A code that names nothing, or is not ours, is a 404 page saying so.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const found = await lookUpScannedText(params.code, ownOrigins(request));
  if (found.status !== "found")
    throw data({ message: found.message }, { status: 404 });
  const { answer } = found;
  throw redirect(
    answer.kind === "lot"
      ? `/stock/lots/${answer.lotId}`
      : userCan(user, "recordStock")
        ? recordPageWithLocation(answer.code)
        : "/stock",
  );
}

export default function Scan() {
  return null;
}
