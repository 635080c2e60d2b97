import type { Route } from "./+types/api.v1.lot-documents";
import { requireUser } from "~/auth/guard.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { methodNotAllowed } from "~/lib/api.server";
import { lotOfApiPath } from "~/lots/lot-api.server";
import { listLotDocuments } from "~/lots/lot-documents.server";

/**
 * GET /api/v1/lots/:lot/documents?sku= (everyone signed in) → 200 { lot: { id, number, sku,
 * supplier, supplierBatch }, documents: [{ id, fileName, title, contentType, sizeBytes,
 * sha256, addedBy, addedAt, url }] }, newest first; `url` downloads the file. 404 / 409 as
 * for where-used.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  return answerDomainError(async () => {
    const { lot, json } = await lotOfApiPath(request, params.lot);
    const documents = await listLotDocuments(lot.id);
    return Response.json({
      lot: json,
      documents: documents.map((document) => ({
        ...document,
        url: `/stock/lots/${lot.id}/documents/${document.id}`,
      })),
    });
  });
}

export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
