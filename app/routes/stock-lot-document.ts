import type { Route } from "./+types/stock-lot-document";
import { requireUser } from "~/auth/guard.server";
import { attachmentDisposition } from "~/lots/certificate-rules";
import { idFromText } from "~/lib/search-params";
import { readLotDocument } from "~/lots/lot-documents.server";

const notFound = () =>
  new Response("No such certificate.\n", {
    status: 404,
    headers: { "Content-Type": "text/plain; charset=utf-8" },
  });

/**
 * GET /stock/lots/:lotId/documents/:documentId — the certificate as a download, for everyone
 * signed in: the type judged at upload, always `attachment`, never sniffed (nosniff), and a
 * policy that lets nothing in it run or load should a browser show it anyway.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const lotId = idFromText(params.lotId);
  const documentId = idFromText(params.documentId);
  if (lotId === null || documentId === null) return notFound();
  const document = await readLotDocument(lotId, documentId);
  if (!document) return notFound();
  return new Response(new Uint8Array(document.content), {
    headers: {
      "Content-Type": document.contentType,
      "Content-Length": String(document.content.byteLength),
      "Content-Disposition": attachmentDisposition(document.fileName),
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": "default-src 'none'; sandbox",
      "Cross-Origin-Resource-Policy": "same-origin",
      "Cache-Control": "private, no-store",
    },
  });
}
