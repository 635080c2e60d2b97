import type { Route } from "./+types/api.v1.build-order-step";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  answerBuildOrderError,
  orderIdFrom,
  readOptionalJsonBody,
} from "~/build-orders/build-order-api.server";
import {
  cancelBuildOrder,
  completeBuildOrder,
} from "~/build-orders/build-order-closing.server";
import { findBuildOrder } from "~/build-orders/build-order-details.server";
import {
  closeRequestSchema,
  issueRequestSchema,
  reserveRequestSchema,
} from "~/build-orders/build-order-forms";
import { issueToBuildOrder } from "~/build-orders/build-order-issues.server";
import { reserveBuildOrderStock } from "~/build-orders/build-order-reservations.server";
import {
  buildOrderApiStepOf,
  buildOrderStepCapabilities,
} from "~/build-orders/build-order-steps";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  if (!buildOrderApiStepOf(params.step))
    return apiError(404, `No build-order step "${params.step}".`);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/build-orders/:orderId/:step
 * - reserve { partial? } (builder) → 200 { id, status, reserved, shortages }; 409 with the shortages, nothing reserved
 * - issue { sku, lot?, location, quantity | grossKg, note? } (storekeeper) → 201 { movement, balance, line, status }
 * - cancel { note? } (builder) → 200 { id, status, released }
 * - complete { note? } (builder) → 200 the order with planned versus actual
 */
export async function action({ request, params }: Route.ActionArgs) {
  await requireUser(request);
  const step = buildOrderApiStepOf(params.step);
  if (!step) return apiError(404, `No build-order step "${params.step}".`);
  const user = await requireCapability(
    request,
    buildOrderStepCapabilities[step],
  );
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const id = orderIdFrom(params.orderId);
  return answerBuildOrderError(async () => {
    switch (step) {
      case "reserve": {
        const body = await readOptionalJsonBody(request, reserveRequestSchema);
        return Response.json(await reserveBuildOrderStock(id, user.id, body));
      }
      case "issue": {
        const body = await readJsonBody(request, issueRequestSchema);
        return Response.json(await issueToBuildOrder(id, body, user.id), {
          status: 201,
        });
      }
      case "cancel": {
        const { note } = await readOptionalJsonBody(
          request,
          closeRequestSchema,
        );
        return Response.json(await cancelBuildOrder(id, user.id, note));
      }
      default: {
        const { note } = await readOptionalJsonBody(
          request,
          closeRequestSchema,
        );
        const closed = await completeBuildOrder(id, user.id, note);
        return Response.json({
          ...(await findBuildOrder(id)),
          released: closed.released,
        });
      }
    }
  });
}
