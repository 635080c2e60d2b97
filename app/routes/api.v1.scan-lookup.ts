import type { Route } from "./+types/api.v1.scan-lookup";
import { requireUser } from "~/auth/guard.server";
import { lookUpScannedText, ownOrigins } from "~/labels/scan-lookup.server";
import { scanLookupQuerySchema } from "~/labels/scan-lookup-query";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";

/**
 * GET /api/v1/scan-lookup?code=L123 → what a scanned label stands for:
 * { kind: "lot", code, lotId, sku, name, lot, unit, onHand, location, locations } or
 * { kind: "location", code, name }; 400 for a code that is not Turnledger's (another
 * company's barcode, a GS1 code, an address elsewhere), 404 for one of ours that names
 * nothing. Every role may look codes up (every role reads stock).
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const { code } = readSearchParams(request, scanLookupQuerySchema);
  const found = await lookUpScannedText(code ?? "", ownOrigins(request));
  if (found.status === "foreign") return apiError(400, found.message);
  if (found.status === "unknown") return apiError(404, found.message);
  return Response.json(found.answer);
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
