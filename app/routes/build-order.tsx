import type { SubmissionResult } from "@conform-to/react";
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/build-order";
import {
  refuseUnless,
  requireCapability,
  requireUser,
} from "~/auth/guard.server";
import {
  cancelBuildOrder,
  changeBuildOrderPlannedStart,
  changeBuildOrderQuantity,
  completeBuildOrder,
} from "~/build-orders/build-order-closing.server";
import {
  findBuildOrder,
  type BuildOrderDetails,
} from "~/build-orders/build-order-details.server";
import {
  isBuildOrderError,
  type Shortage,
} from "~/build-orders/build-order-errors";
import {
  intentSchemas,
  isBuildOrderIntent,
  issueFormFieldOf,
  type BuildOrderIntent,
} from "~/build-orders/build-order-forms";
import { issueToBuildOrder } from "~/build-orders/build-order-issues.server";
import { buildOrderIdFromPath } from "~/build-orders/build-order-path";
import { reserveBuildOrderStock } from "~/build-orders/build-order-reservations.server";
import {
  buildOrderReference,
  canCancel,
  canChangePlannedStart,
  canComplete,
  canIssue,
  canReserve,
} from "~/build-orders/build-order-status";
import {
  buildOrderStepNote,
  type BuildOrderStepOutcome,
} from "~/build-orders/build-order-step-notes";
import { buildOrderStepCapabilities } from "~/build-orders/build-order-steps";
import {
  heldSpots,
  heldSpotsKey,
  issuesNewestFirst,
  primaryStepOf,
} from "~/build-orders/build-order-view";
import { BuildOrderHeading } from "~/components/build-orders/build-order-heading";
import { BuildOrderSummary } from "~/components/build-orders/build-order-summary";
import { ChangeOrCancelPanel } from "~/components/build-orders/change-or-cancel-panel";
import { CompletePanel } from "~/components/build-orders/complete-panel";
import { HistoryPanel } from "~/components/build-orders/history-panel";
import { IssuePanel } from "~/components/build-orders/issue-panel";
import { IssuedStockPanel } from "~/components/build-orders/issued-stock-panel";
import { NeedsPanel } from "~/components/build-orders/needs-panel";
import { PlannedStartPanel } from "~/components/build-orders/planned-start-panel";
import { PlannedAndUsedPanel } from "~/components/build-orders/planned-and-used-panel";
import { ReservePanel } from "~/components/build-orders/reserve-panel";
import { BuildOrderLotsPanel } from "~/components/lots/build-order-lots-panel";
import { FormMessages } from "~/components/text-field";
import { redirectWithFlash } from "~/lib/flash.server";
import { needsRoleMessage, userCan } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { refusalReply } from "~/lib/refusal-reply";
import { buildOrderLots } from "~/lots/where-used.server";

function orderIdOf(value: string | undefined): number {
  return buildOrderIdFromPath(value, (message) =>
    data({ message }, { status: 404 }),
  );
}

async function orderOr404(id: number): Promise<BuildOrderDetails> {
  const order = await findBuildOrder(id);
  if (!order)
    throw data(
      { message: `No build order ${buildOrderReference(id)}.` },
      { status: 404 },
    );
  return order;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const order = await orderOr404(orderIdOf(params.orderId));
  return {
    order,
    lots: await buildOrderLots(order.id),
    can: {
      build: userCan(user, "runBuildOrders"),
      issue: userCan(user, "issueToBuildOrders"),
    },
  };
}

interface StepAnswer {
  intent: string;
  result: SubmissionResult<string[]>;
  shortages?: Shortage[];
}

function stepRefused(
  intent: string,
  result: SubmissionResult<string[]>,
  status: number,
  shortages?: Shortage[],
) {
  return data<StepAnswer>({ intent, result, shortages }, { status });
}

/** Back to the order's page, with the message of the step taken. */
async function done(
  orderId: number,
  outcome: BuildOrderStepOutcome,
): Promise<never> {
  throw await redirectWithFlash(
    `/build-orders/${orderId}`,
    buildOrderStepNote(orderId, outcome),
  );
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "takeBuildOrderSteps");
  const id = orderIdOf(params.orderId);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (isBuildOrderIntent(intent)) {
    const needed = buildOrderStepCapabilities[intent];
    refuseUnless(request, user, needed, needsRoleMessage(needed, "This step"));
  }
  await orderOr404(id);
  if (!isBuildOrderIntent(intent)) {
    return stepRefused(
      "",
      {
        status: "error",
        error: { "": ["Choose a step: reserve, issue, complete or cancel."] },
      },
      400,
    );
  }
  const submission = parseForm(formData, {
    schema: intentSchemas[intent],
    disableAutoCoercion: true,
  });
  if (submission.status !== "success")
    return stepRefused(intent, submission.reply(), 400);
  const value = submission.value;
  try {
    switch (value.intent) {
      case "reserve": {
        const { reserved } = await reserveBuildOrderStock(id, user.id, {
          partial: value.partial,
        });
        return done(id, { step: "reserve", reservedCount: reserved.length });
      }
      case "issue": {
        const { movement } = await issueToBuildOrder(id, value, user.id);
        return done(id, { step: "issue", movementId: movement.id });
      }
      case "cancel": {
        await cancelBuildOrder(id, user.id, value.note);
        return done(id, { step: "cancel" });
      }
      case "complete": {
        await completeBuildOrder(id, user.id, value.note);
        return done(id, { step: "complete" });
      }
      case "quantity": {
        const { released } = await changeBuildOrderQuantity(
          id,
          value.quantity,
          user.id,
        );
        return done(id, { step: "quantity", releasedCount: released.length });
      }
      case "plannedStart": {
        await changeBuildOrderPlannedStart(id, value.plannedStart, user.id);
        return done(id, { step: "plannedStart" });
      }
    }
  } catch (error) {
    if (isBuildOrderError(error) || isDomainError(error)) {
      const field =
        intent === "issue"
          ? issueFormFieldOf(error.field)
          : (intent === "quantity" || intent === "plannedStart") &&
              error.field === intent
            ? intent
            : "";
      const result = refusalReply(submission, field, error.message);
      return stepRefused(
        intent,
        result,
        error.status === 404 ? 400 : error.status,
        isBuildOrderError(error) ? error.shortages : undefined,
      );
    }
    throw error;
  }
  return null;
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `${loaderData.order.reference} ${loaderData.order.design.name}` : "Build order"} · Turnledger`,
  },
];

export default function BuildOrder({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { order, can } = loaderData;
  const answer = actionData as StepAnswer | null | undefined;
  const primary = primaryStepOf(order, can);
  const resultFor = (intent: BuildOrderIntent) =>
    answer?.intent === intent ? answer.result : undefined;
  const issues = issuesNewestFirst(order.lines);
  const anyIssued = issues.length > 0;
  const needsReserve = order.lines.some((line) => line.toReserve > 0);

  return (
    <div className="space-y-6">
      <BuildOrderHeading order={order} />

      {answer && answer.intent === "" ? (
        <FormMessages errors={answer.result.error?.[""] ?? undefined} />
      ) : null}

      <BuildOrderSummary order={order} anyIssued={anyIssued} />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-6">
          <NeedsPanel order={order} />
          {anyIssued || order.status === "complete" ? (
            <PlannedAndUsedPanel order={order} />
          ) : null}
          {anyIssued ? (
            <IssuedStockPanel reference={order.reference} issues={issues} />
          ) : null}
          {anyIssued ? (
            <BuildOrderLotsPanel
              orderId={order.id}
              reference={order.reference}
              lots={loaderData.lots}
            />
          ) : null}
        </div>

        <div className="space-y-6">
          {can.build && canReserve(order.status) && needsReserve ? (
            <ReservePanel
              order={order}
              primary={primary === "reserve"}
              lastResult={resultFor("reserve")}
              shortages={
                answer?.intent === "reserve" ? answer.shortages : undefined
              }
            />
          ) : null}
          {can.issue && canIssue(order.status) ? (
            <IssuePanel
              key={heldSpotsKey(heldSpots(order.lines))}
              order={order}
              primary={primary === "issue"}
              lastResult={resultFor("issue")}
            />
          ) : null}
          {can.build && canComplete(order.status) ? (
            <CompletePanel
              order={order}
              primary={primary === "complete"}
              lastResult={resultFor("complete")}
            />
          ) : null}
          <PlannedStartPanel
            order={order}
            canChange={can.build && canChangePlannedStart(order.status)}
            lastResult={resultFor("plannedStart")}
          />
          {can.build && canCancel(order.status) ? (
            <ChangeOrCancelPanel
              order={order}
              quantityResult={resultFor("quantity")}
              cancelResult={resultFor("cancel")}
            />
          ) : null}
          <HistoryPanel order={order} />
        </div>
      </div>
    </div>
  );
}
