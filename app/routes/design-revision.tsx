import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import {
  data,
  redirect,
  type ShouldRevalidateFunctionArgs,
} from "react-router";
import type { Route } from "./+types/design-revision";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  answer,
  changedMeanwhile,
  doneAnswer,
  plainRefusal,
  refusal,
  revisionRowId,
  type DesignActionAnswer,
} from "~/components/design/action-replies.server";
import { BillOfMaterials } from "~/components/design/bill-of-materials";
import { DraftFields } from "~/components/design/draft-fields";
import {
  DesignCostPanel,
  WireSubstitutesPanel,
} from "~/components/design/later-panels";
import { DesignFieldsSummary } from "~/components/design/fields-summary";
import { PostedAnswer } from "~/components/design/posted-answer";
import { RevisionHeader } from "~/components/design/revision-header";
import { RevisionNav } from "~/components/design/revision-nav";
import { WindingPanel } from "~/components/design/winding-panel";
import { costQuerySearch } from "~/designs/cost-basis";
import {
  applyLineChange,
  designPageIntentOf,
  formLineId,
  readCostQuery,
} from "~/designs/design-page";
import { loadDesignPage, storedLineInputs } from "~/designs/design-page.server";
import { designParams } from "~/designs/design-params";
import { findRevision } from "~/designs/design-revisions.server";
import { designLineSchema, revisionFormSchema } from "~/designs/design-schemas";
import {
  releaseRevision,
  startNewRevision,
  updateDraftRevision,
} from "~/designs/designs.server";
import { userCan } from "~/lib/capabilities";
import { redirectWithFlash } from "~/lib/flash.server";
import {
  readSubstituteQuery,
  substituteFormSchema,
} from "~/designs/wire-substitute-schemas";
import {
  applyWireSubstitute,
  loadSubstitutePanels,
} from "~/designs/wire-substitutes.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const ids = designParams(params);
  const query = readCostQuery(new URL(request.url).searchParams);
  const page = ids ? await loadDesignPage(ids, query) : null;
  if (!page)
    throw data(
      { message: "There is no such design revision." },
      { status: 404 },
    );
  const substituteQuery = readSubstituteQuery(
    new URL(request.url).searchParams,
  );
  return {
    ...page,
    costQuery: query,
    substituteQuery,
    substitutes: await loadSubstitutePanels(
      ids!,
      substituteQuery.tolerancePercent / 100,
    ),
    canEdit: userCan(user, "editDesigns"),
    // The motor form's constraints for its first render; its check loads after hydration.
    fieldsConstraint: getZodConstraint(revisionFormSchema),
    // The build-order list's creation rule (its loader and action).
    canCreateBuildOrder: userCan(user, "createBuildOrders"),
  };
}

/**
 * Builders' changes to a draft revision, named by `intent`: the motor fields, one line
 * (save or remove), release, or a new revision. A released revision refuses every change
 * (the data layer's 409, shown as it is); bad input gets field messages and writes nothing.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "editDesigns");
  const formData = await request.formData();
  const intent = designPageIntentOf(formData.get("intent"));
  if (!intent)
    return answer(
      {
        intent: null,
        ok: false,
        message:
          "Say what to change: the motor figures, a line, a release or a new revision.",
      },
      400,
    );
  const ids = designParams(params);
  if (!ids)
    throw data(
      { message: "There is no such design revision." },
      { status: 404 },
    );

  switch (intent) {
    case "fields": {
      const submission = parseForm(formData, {
        schema: revisionFormSchema,
      });
      if (submission.status !== "success")
        return answer({ intent, ok: false, result: submission.reply() }, 400);
      const fields = submission.value;
      try {
        // Every field is named, so an emptied optional field is stored as "not given".
        await updateDraftRevision(ids.designId, ids.revision, {
          poles: fields.poles,
          slots: fields.slots,
          ratedCurrentA: fields.ratedCurrentA,
          ratedTorqueNm: fields.ratedTorqueNm,
          torqueBasis: fields.torqueBasis,
          insulationClassC: fields.insulationClassC,
          slotAreaMm2: fields.slotAreaMm2,
          slotLinerAreaMm2: fields.slotLinerAreaMm2,
          coilSidesPerSlot: fields.coilSidesPerSlot,
          phases: fields.phases,
          windingLayers: fields.windingLayers,
          phaseConnection: fields.phaseConnection,
          parallelPaths: fields.parallelPaths,
          ratedSpeedRpm: fields.ratedSpeedRpm,
          airGapRadiusMm: fields.airGapRadiusMm,
          airGapFluxDensityT: fields.airGapFluxDensityT,
          poleCoverage: fields.poleCoverage,
          notes: fields.notes,
        });
      } catch (error) {
        return refusal(intent, submission, error);
      }
      return doneAnswer(
        { intent, ok: true, result: submission.reply() },
        { code: "design-motor-saved" },
      );
    }

    case "save-line":
    case "remove-line": {
      const lineId = formLineId(formData.get("lineId"));
      const submission =
        intent === "save-line"
          ? parseForm(formData, { schema: designLineSchema })
          : null;
      if (submission && submission.status !== "success")
        return answer({ intent, ok: false, result: submission.reply() }, 400);
      if (lineId === "bad" || (intent === "remove-line" && lineId === null))
        return answer(
          { intent, ok: false, message: "Say which line (its id)." },
          400,
        );
      const found = await findRevision(ids.designId, ids.revision);
      if (!found)
        return answer(
          { intent, ok: false, message: "There is no such design revision." },
          404,
        );
      const current = await storedLineInputs(found.revision.id);
      const change = applyLineChange(
        current,
        submission?.status === "success"
          ? { kind: "save", lineId, line: submission.value }
          : { kind: "remove", lineId: lineId! },
      );
      try {
        // With no change to make, this still refuses a released revision with the data layer's message.
        // The lines are replaced only if nobody changed them since they were read here.
        await updateDraftRevision(
          ids.designId,
          ids.revision,
          change
            ? {
                lines: change.lines,
                expectLineIds: current.map((line) => line.id),
              }
            : {},
        );
      } catch (error) {
        return submission
          ? refusal(intent, submission, error, change?.index ?? null)
          : plainRefusal(intent, error);
      }
      if (!change)
        return answer(
          {
            intent,
            ok: false,
            message: changedMeanwhile,
            result: submission?.reply({ formErrors: [changedMeanwhile] }),
          },
          409,
        );
      return doneAnswer(
        {
          intent,
          ok: true,
          result: submission?.reply(),
          position: change.index >= 0 ? change.index + 1 : undefined,
        },
        {
          code:
            intent === "remove-line"
              ? "design-line-removed"
              : "design-line-saved",
        },
      );
    }

    case "release": {
      try {
        await releaseRevision(ids.designId, ids.revision, user.id);
      } catch (error) {
        return plainRefusal(intent, error);
      }
      const body: DesignActionAnswer = {
        intent,
        ok: true,
        message: `Revision ${ids.revision} is released: it is read-only from now on.`,
      };
      const rowId = await revisionRowId(ids.designId, ids.revision);
      return rowId === null
        ? answer(body)
        : doneAnswer(body, { code: "design-revision-released", id: rowId });
    }

    case "use-substitute":
      return applySubstitute(ids, formData);

    case "new-revision": {
      let next: { revision: number };
      try {
        next = await startNewRevision(ids.designId);
      } catch (error) {
        return plainRefusal(intent, error);
      }
      const page = `/designs/${ids.designId}/revisions/${next.revision}`;
      const rowId = await revisionRowId(ids.designId, next.revision);
      return rowId === null
        ? redirect(page)
        : redirectWithFlash(page, {
            code: "design-revision-started",
            id: rowId,
          });
    }
  }
}

/** Applies a substitute from stock to a coil line; a flash message on the revision it went to. */
async function applySubstitute(
  ids: { designId: number; revision: number },
  formData: FormData,
) {
  const intent = "use-substitute";
  const submission = parseForm(formData, { schema: substituteFormSchema });
  if (submission.status !== "success")
    return answer({ intent, ok: false, result: submission.reply() }, 400);
  const { line, sku, strands, tolerance } = submission.value;
  try {
    const applied = await applyWireSubstitute(
      { ...ids, position: line },
      { sku, strands },
      tolerance / 100,
    );
    return redirectWithFlash(
      `/designs/${ids.designId}/revisions/${applied.revision}`,
      { code: "wire-substitute-applied", id: applied.lineId },
    );
  } catch (error) {
    return refusal(intent, submission, error);
  }
}

/** A refused change (409) may come from a change made meanwhile: read the page again to show it. */
export function shouldRevalidate({
  actionStatus,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  return actionStatus === 409 ? true : defaultShouldRevalidate;
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: loaderData
      ? `${loaderData.revision.name} rev. ${loaderData.revision.revision} · Designs · Turnledger`
      : "Design · Turnledger",
  },
];

export default function DesignRevisionPage({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const {
    revision,
    revisions,
    lines,
    costing,
    costQuery,
    canEdit,
    canCreateBuildOrder,
    substitutes,
    substituteQuery,
  } = loaderData;
  const draft = revision.status === "draft";
  const latest = revisions[0]?.revision ?? revision.revision;
  const query = costQuerySearch(costQuery);

  return (
    <div className="space-y-8">
      <div className="space-y-4">
        <RevisionHeader
          revision={revision}
          warnings={costing.warnings}
          costQuery={costQuery}
          query={query}
          latest={latest}
          canEdit={canEdit}
          canCreateBuildOrder={canCreateBuildOrder}
        />
        <RevisionNav
          designId={revision.designId}
          current={revision.revision}
          revisions={revisions}
          query={query}
        />
        <PostedAnswer answer={actionData} />
        {!draft ? (
          <p
            role="status"
            className="rounded-md border border-graphite-300 bg-graphite-50 px-4 py-2 text-sm"
          >
            This revision is released and read-only: build orders can use it.
            {canEdit && revision.revision === latest
              ? ` To change the design, start revision ${latest + 1} (a copy of this one).`
              : ""}
          </p>
        ) : null}
      </div>

      {canEdit && draft ? (
        <DraftFields
          revision={revision}
          constraint={loaderData.fieldsConstraint}
        />
      ) : (
        <DesignFieldsSummary revision={revision} />
      )}

      <WindingPanel winding={costing.winding} />

      <BillOfMaterials
        lines={lines}
        costing={costing}
        insulationClassC={revision.insulationClassC}
        editable={canEdit && draft}
      />

      <WireSubstitutesPanel
        panels={substitutes}
        query={substituteQuery}
        keep={Object.fromEntries(new URLSearchParams(query))}
        currency={costing.currency}
        canEdit={canEdit}
      />

      <DesignCostPanel
        costing={costing}
        query={costQuery}
        lines={lines}
        torqueBasis={revision.torqueBasis}
      />
    </div>
  );
}
