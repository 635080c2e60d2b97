import type { Route } from "./+types/api.v1.outbox";
import { requireRole } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { listOutbox } from "~/mail/outbox.server";

/** GET /api/v1/outbox?limit=100 → [{ to, subject, text, sentAt }], newest first. Admins only. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, ["admin"]);
  const limit = Number(new URL(request.url).searchParams.get("limit") ?? 100);
  if (!Number.isInteger(limit) || limit < 1 || limit > 500) {
    return Response.json(
      {
        error: {
          message: "limit must be a whole number from 1 to 500.",
          fields: { limit: ["1 to 500"] },
        },
      },
      { status: 400 },
    );
  }
  const { messages } = await listOutbox(1, limit);
  return Response.json(
    messages.map((message) => ({
      to: message.to,
      subject: message.subject,
      text: message.text,
      sentAt: message.sentAt?.toISOString() ?? null,
    })),
  );
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireRole(request, ["admin"]);
  return methodNotAllowed(["GET"]);
}
