import type { Route } from "./+types/api.v1.outbox";
import { requireCapability } from "~/auth/guard.server";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { listOutbox } from "~/mail/outbox.server";
import { outboxQuerySchema } from "~/mail/outbox-query";

/** GET /api/v1/outbox?limit=100 → [{ to, subject, text, sentAt, attachments: [{ fileName, contentType, byteSize }] }], newest first. Admins only. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "readOutbox");
  const { limit } = readSearchParams(request, outboxQuerySchema);
  const { messages } = await listOutbox(1, limit);
  return Response.json(
    messages.map((message) => ({
      to: message.to,
      subject: message.subject,
      text: message.text,
      sentAt: message.sentAt?.toISOString() ?? null,
      attachments: message.attachments,
    })),
  );
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireCapability(request, "readOutbox");
  return methodNotAllowed(["GET"]);
}
