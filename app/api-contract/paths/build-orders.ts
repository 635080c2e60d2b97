/**
 * Build orders in the contract: the list, creating one, one order and its changes, the
 * steps (reserve, issue, cancel, complete) and the lots issued to it.
 */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { buildOrderListQuerySchema } from "~/build-orders/build-order-list-address";
import {
  buildOrderChangeSchema,
  buildOrderCreateSchema,
  closeRequestSchema,
  issueRequestSchema,
  reserveRequestSchema,
} from "~/build-orders/build-order-forms";
import {
  buildOrderApiSteps,
  buildOrderStepCapabilities,
} from "~/build-orders/build-order-steps";
import { apiOperation, jsonAnswer, rolesAllowed } from "../operation";
import { pageOf } from "../pages";
import {
  buildOrderChangedSchema,
  buildOrderCreatedSchema,
  buildOrderLotsSchema,
  buildOrderRefusalSchema,
  buildOrderSchema,
  buildOrderSummarySchema,
  completedSchema,
  issuedSchema,
  releasedSchema,
  reservationSchema,
} from "../schemas/build-orders";

const tag = "Build orders";

const orderId = z
  .string()
  .regex(/^\d{1,10}$/)
  .meta({
    description:
      "The order's number (BO-12 is 12). Anything but a whole number answers 404.",
    example: "3",
  });

const orderPath = z.object({ orderId });

const noOrder = "No build order with that number.";

const stepPath = z.object({
  orderId,
  step: z.enum(buildOrderApiSteps).meta({
    description:
      "reserve, issue, cancel or complete; any other step answers 404.",
    example: "reserve",
  }),
});

/** The roles of each step, as the route checks them after the sign-in. */
const stepRoles = Object.fromEntries(
  buildOrderApiSteps.map((step) => [
    step,
    rolesAllowed(buildOrderStepCapabilities[step]),
  ]),
) as Record<(typeof buildOrderApiSteps)[number], string[]>;

const stepBody = z
  .union([
    reserveRequestSchema.meta({
      id: "BuildOrderReserveRequest",
      description:
        "`reserve`: what the lines still need, oldest lot first. All or nothing unless `partial` is true (then what is free is reserved and the rest listed as shortages). May be left out.",
      example: { partial: false },
    }),
    issueRequestSchema.meta({
      id: "BuildOrderIssueRequest",
      description:
        "`issue`: stock the order holds, from one lot and location, by `quantity` or by weighing the spool back (`grossKg`, the spool's gross weight now): exactly one of the two.",
      example: {
        sku: "CU-IEC-0500",
        lot: "Q-25-11873",
        location: "WIRE-A1",
        quantity: 1.84,
      },
    }),
    closeRequestSchema.meta({
      id: "BuildOrderCloseRequest",
      description:
        "`cancel` and `complete`: an optional note for the order's history. May be left out.",
      example: { note: "All six passed the hi-pot and back-EMF checks." },
    }),
  ])
  .meta({
    description:
      "The body of the step named in the path: `reserve` takes BuildOrderReserveRequest, `issue` BuildOrderIssueRequest (required), `cancel` and `complete` BuildOrderCloseRequest.",
  });

const stepDescription = [
  "One step of the order, named in the path. Each answers differently:",
  "",
  "- `reserve` → 200 BuildOrderReservation. The first reservation makes a draft `reserved`. When stock is short and `partial` is not set, 409 with `error.shortages` and nothing reserved.",
  "- `issue` → 201 BuildOrderIssue, through the stock ledger; the first issue makes the order `in_progress`.",
  "- `cancel` → 200 BuildOrderCancelled: what the order held is released; stock already issued stays issued (return it with a return movement).",
  "- `complete` → 200 BuildOrderCompleted: the order with planned versus actual; what it still held is released.",
  "",
  `**Who may call:** each step its own roles: ${buildOrderApiSteps
    .map((step) => `${step}: ${stepRoles[step].join(", ")}`)
    .join("; ")}.`,
].join("\n");

export const buildOrderPaths: ZodOpenApiPathsObject = {
  "/api/v1/build-orders": {
    get: apiOperation({
      operationId: "listBuildOrders",
      summary: "A page of build orders",
      description:
        "Newest first; `search` finds an order by its reference (BO-12, 12) or by part of its design's name.",
      tag,
      caller: "signedIn",
      query: buildOrderListQuerySchema,
      answers: {
        200: jsonAnswer(
          "A page of build orders.",
          pageOf("BuildOrderPage", "buildOrders", buildOrderSummarySchema),
        ),
      },
    }),
    post: apiOperation({
      operationId: "createBuildOrder",
      summary: "Start a build order for motors of a released revision",
      description:
        "Works out what the motors need from the revision's lines; the order is a draft until stock is reserved for it.",
      tag,
      caller: "createBuildOrders",
      body: buildOrderCreateSchema,
      answers: {
        201: jsonAnswer("The new draft order.", buildOrderCreatedSchema),
      },
      refusals: {
        404: "The design has no such revision.",
        409: "The revision is a draft, has no lines, a line cannot be worked out, or an item is gone or stocked in another unit.",
      },
    }),
  },
  "/api/v1/build-orders/{orderId}": {
    get: apiOperation({
      operationId: "getBuildOrder",
      summary: "One build order with its lines, costs and history",
      tag,
      caller: "signedIn",
      path: orderPath,
      answers: { 200: jsonAnswer("The order.", buildOrderSchema) },
      refusals: { 404: noOrder },
    }),
    patch: apiOperation({
      operationId: "changeBuildOrder",
      summary: "Change an order's number of motors or planned start",
      description:
        "A new number of motors is taken while nothing has been issued to the order: what it held is released and it is a draft again. A new planned start (null clears it) is taken while the order is open. The number of motors is changed first, so a refusal leaves nothing half-written.",
      tag,
      caller: "runBuildOrders",
      path: orderPath,
      body: buildOrderChangeSchema,
      answers: {
        200: jsonAnswer("The order after the change.", buildOrderChangedSchema),
      },
      refusals: {
        404: noOrder,
        409: "The order's state forbids the change (stock already issued, or the order is closed), or the revision cannot be worked out for the new number.",
      },
    }),
  },
  "/api/v1/build-orders/{orderId}/{step}": {
    post: apiOperation({
      operationId: "takeBuildOrderStep",
      summary: "Reserve, issue to, cancel or complete a build order",
      tag,
      caller: "signedIn",
      path: stepPath,
      body: stepBody,
      bodyOptional: true,
      answers: {
        200: jsonAnswer(
          "`reserve`, `cancel` or `complete` done.",
          z.union([reservationSchema, releasedSchema, completedSchema]),
        ),
        201: jsonAnswer("`issue` done: the movement recorded.", issuedSchema),
        409: jsonAnswer(
          "The order's state forbids the step (for example issuing to a draft, or completing a cancelled order), the order needs no such item, the lot is on hold, or a reservation could not be covered (with `shortages`); nothing was changed.",
          buildOrderRefusalSchema,
        ),
      },
      refusals: {
        403: "Signed in, but without a role this step needs.",
        404: "No build order with that number, or no such step.",
      },
      // Each step has its own roles: the shared "who may call" line would say anyone signed in.
      extra: {
        description: stepDescription,
        "x-roles": [...new Set(Object.values(stepRoles).flat())],
      },
    }),
  },
  "/api/v1/build-orders/{orderId}/lots": {
    get: apiOperation({
      operationId: "listBuildOrderLots",
      summary: "The lots issued to a build order",
      description:
        "For tracing: every lot issued to the order, issues net of the returns that name it.",
      tag,
      caller: "signedIn",
      path: orderPath,
      answers: { 200: jsonAnswer("The order's lots.", buildOrderLotsSchema) },
      refusals: { 404: noOrder },
    }),
  },
};
