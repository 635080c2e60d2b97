import { parseWithZod } from "@conform-to/zod/v4";
import type { Submission } from "@conform-to/react";
import { useCallback, useMemo, useRef, useState } from "react";
import {
  data,
  Link,
  redirect,
  useFetchers,
  type ShouldRevalidateFunctionArgs,
} from "react-router";
import type { Route } from "./+types/design-revision";
import { requireRole, requireUser } from "~/auth/guard.server";
import type { DesignActionAnswer } from "~/components/design-action-answer";
import { DesignCostPanel, money } from "~/components/design-cost-panel";
import { costBasisText } from "~/components/design/price-basis-note";
import {
  DesignFieldsForm,
  DesignFieldsSummary,
} from "~/components/design-fields-form";
import { DesignInsulationCaution } from "~/components/design-insulation-caution";
import {
  CreateBuildOrderForm,
  NewRevisionButton,
  ReleaseControl,
  StatusMark,
} from "~/components/design/revision-actions";
import {
  DesignLineEditor,
  type LineKind,
} from "~/components/design-line-editor";
import {
  CoilLinesTable,
  DesignWarningList,
  MagnetLinesTable,
  PartLinesTable,
  type LineTableActions,
} from "~/components/design-line-tables";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import {
  applyLineChange,
  costQuerySearch,
  designPageIntentOf,
  lineIndexOfField,
  readCostQuery,
  type DesignPageIntent,
} from "~/designs/design-page";
import {
  loadDesignPage,
  storedLineInputs,
  type DesignPageLine,
} from "~/designs/design-page.server";
import { designParams } from "~/designs/design-params";
import { findRevision } from "~/designs/design-revisions.server";
import {
  designLineSchema,
  revisionFieldsSchema,
} from "~/designs/design-schemas";
import {
  releaseRevision,
  startNewRevision,
  updateDraftRevision,
} from "~/designs/designs.server";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { userHasRole } from "~/lib/roles";
import { formatMass, formatSignificant } from "~/reference/quantity-display";
import { isDomainError } from "~/lib/domain-error";

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
  return {
    ...page,
    costQuery: query,
    canEdit: userHasRole(user, ["builder"]),
    // The build-order list's creation rule (its loader and action).
    canCreateBuildOrder: userHasRole(user, ["builder"]),
  };
}

type Answer = DesignActionAnswer;
const answer = (body: Answer, status = 200) => data(body, { status });

/** A refusal of the data layer (released, unknown item …) as the form shows it; other errors go on. */
function refusal(
  intent: DesignPageIntent,
  submission: Submission<unknown>,
  error: unknown,
  lineIndex: number | null = null,
) {
  if (!isDomainError(error)) throw error;
  const index = lineIndexOfField(error.field);
  const field =
    index !== null
      ? index === lineIndex
        ? error.field?.replace(/^lines\[\d+\]\./, "")
        : undefined
      : error.field;
  return answer(
    {
      intent,
      ok: false,
      message: error.message,
      result: submission.reply(
        field
          ? { fieldErrors: { [field]: [error.message] } }
          : { formErrors: [error.message] },
      ),
    },
    error.status,
  );
}

/** A message for a change the page could not make at all (no form to show it beside). */
function plainRefusal(intent: DesignPageIntent, error: unknown) {
  if (!isDomainError(error)) throw error;
  return answer({ intent, ok: false, message: error.message }, error.status);
}

const changedMeanwhile =
  "This line was changed or removed meanwhile (another save of this revision). The page now shows the lines as they are: make the change again.";

function lineIdOf(value: FormDataEntryValue | null): number | null | "bad" {
  if (value === null || value === "") return null;
  const id = Number(value);
  return Number.isSafeInteger(id) && id > 0 ? id : "bad";
}

/**
 * Builders' changes to a draft revision, named by `intent`: the motor fields, one line
 * (save or remove), release, or a new revision. A released revision refuses every change
 * (the data layer's 409, shown as it is); bad input gets field messages and writes nothing.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, ["builder"]);
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
      const submission = parseWithZod(formData, {
        schema: revisionFieldsSchema,
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
          coilSidesPerSlot: fields.coilSidesPerSlot,
          airGapRadiusMm: fields.airGapRadiusMm,
          airGapFluxDensityT: fields.airGapFluxDensityT,
          poleCoverage: fields.poleCoverage,
          notes: fields.notes,
        });
      } catch (error) {
        return refusal(intent, submission, error);
      }
      return answer({ intent, ok: true, result: submission.reply() });
    }

    case "save-line":
    case "remove-line": {
      const lineId = lineIdOf(formData.get("lineId"));
      const submission =
        intent === "save-line"
          ? parseWithZod(formData, { schema: designLineSchema })
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
      return answer({
        intent,
        ok: true,
        result: submission?.reply(),
        position: change.index >= 0 ? change.index + 1 : undefined,
      });
    }

    case "release": {
      try {
        await releaseRevision(ids.designId, ids.revision, user.id);
      } catch (error) {
        return plainRefusal(intent, error);
      }
      return answer({
        intent,
        ok: true,
        message: `Revision ${ids.revision} is released: it is read-only from now on.`,
      });
    }

    case "new-revision": {
      let next: { revision: number };
      try {
        next = await startNewRevision(ids.designId);
      } catch (error) {
        return plainRefusal(intent, error);
      }
      return redirect(`/designs/${ids.designId}/revisions/${next.revision}`);
    }
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

type LoaderData = Route.ComponentProps["loaderData"];

/** A coil line's figures as last saved, beside its editor. */
function EditedLineFigures({
  loaderData,
  position,
}: {
  loaderData: LoaderData;
  position: number;
}) {
  const { costing } = loaderData;
  const coil = costing.coils.find((figures) => figures.line === position);
  const cost = costing.lines[position - 1];
  const rows: [string, string][] = [];
  if (coil) {
    rows.push(
      ["Copper per motor", formatQuantity(coil.copperLengthM, "m", 3)],
      [
        "Drawn from stock",
        `${formatMass(coil.drawnMassKg)}${coil.massBasis === "bare" ? " (bare conductor)" : ""}`,
      ],
      [
        "R per coil at 20 °C",
        formatSignificant(coil.resistance20PerCoilOhm, "Ω", 4),
      ],
      [
        `R per coil hot (${formatQuantity(coil.operatingTemperatureC, "°C", 0)})`,
        formatSignificant(coil.resistancePerCoilOhm, "Ω", 4),
      ],
      ["Active share", formatQuantity(coil.activeShare * 100, "%", 1)],
      [
        "Copper loss at rated current",
        coil.copperLossW === null
          ? "—"
          : formatQuantity(coil.copperLossW, "W", 2),
      ],
    );
  }
  if (cost)
    rows.push([
      "Line cost per motor",
      cost.cost === null ? "no price" : money(cost.cost, costing.currency),
    ]);
  rows.push([
    `Cost per motor, at the ${costBasisText(costing.basis)}`,
    money(costing.costPerMotor, costing.currency),
  ]);
  return (
    <div className="rounded-md border border-rule bg-white/70 p-3">
      <p className="mb-1 text-xs font-semibold uppercase tracking-wide text-graphite-500">
        Line {position} as saved
      </p>
      <dl className="text-sm">
        {rows.map(([label, value]) => (
          <div
            key={label}
            className="flex justify-between gap-3 border-b border-graphite-100 py-1 last:border-0"
          >
            <dt className="text-graphite-700">{label}</dt>
            <dd className="text-right tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

/**
 * The answer to a form sent without JavaScript (the page's forms are fetchers, whose
 * answers show beside them; a plain post lands here instead).
 */
function PostedAnswer({ answer }: { answer: DesignActionAnswer | undefined }) {
  if (!answer) return null;
  const messages = answer.message
    ? [answer.message]
    : Object.entries(answer.result?.error ?? {}).flatMap(([name, errors]) =>
        (errors ?? []).map((error) => (name ? `${name}: ${error}` : error)),
      );
  if (messages.length === 0) return null;
  return (
    <div
      role={answer.ok ? "status" : "alert"}
      className={`rounded-md border px-4 py-2 text-sm ${
        answer.ok
          ? "border-ok/40 bg-ok/5 text-ok"
          : "border-danger/40 bg-danger/5 text-danger"
      }`}
    >
      {answer.ok ? null : <p className="font-semibold">Nothing was changed.</p>}
      <ul>
        {messages.map((message) => (
          <li key={message}>{message}</li>
        ))}
      </ul>
    </div>
  );
}

interface Editing {
  session: number;
  kind: LineKind;
  /** The line's position; null while a new line is not added yet. */
  position: number | null;
}

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
  } = loaderData;
  const draft = revision.status === "draft";
  const editable = canEdit && draft;
  const latest = revisions[0]?.revision ?? revision.revision;
  const query = costQuerySearch(costQuery);
  const base = `/designs/${revision.designId}/revisions/${revision.revision}`;

  const sessions = useRef(0);
  const [editing, setEditing] = useState<Editing | null>(null);
  const startEditing = useCallback(
    (kind: LineKind, position: number | null) => {
      sessions.current += 1;
      setEditing({ session: sessions.current, kind, position });
    },
    [],
  );
  const onAdded = useCallback(
    (position: number) =>
      setEditing((current) => (current ? { ...current, position } : current)),
    [],
  );
  const close = useCallback(() => setEditing(null), []);
  const editingLine =
    editing?.position != null
      ? (lines.find((line) => line.position === editing.position) ?? null)
      : null;
  // The line went (removed elsewhere) or the revision was released: nothing to edit.
  const editorOpen =
    editable &&
    editing !== null &&
    (editing.position === null || editingLine !== null);

  const actions: LineTableActions = useMemo(
    () => ({
      onEdit: editable
        ? (line: DesignPageLine) => startEditing(line.kind, line.position)
        : null,
      onRemove: close,
      editingPosition: editorOpen ? (editing?.position ?? null) : null,
    }),
    [editable, startEditing, close, editorOpen, editing?.position],
  );

  const busy = useFetchers().some((fetcher) => fetcher.state !== "idle");
  const coils = lines.filter((line) => line.kind === "coil");
  const magnets = lines.filter((line) => line.kind === "magnet");
  const parts = lines.filter((line) => line.kind === "part");
  const warningsOf = (kind: LineKind) =>
    costing.warnings.filter(
      (warning) => lines[warning.line - 1]?.kind === kind,
    );

  const editor = (kind: LineKind) =>
    editorOpen && editing?.kind === kind ? (
      <DesignLineEditor
        key={editing.session}
        formId={`design-line-${editing.session}`}
        kind={kind}
        line={editingLine}
        figures={
          editingLine ? (
            <EditedLineFigures
              loaderData={loaderData}
              position={editingLine.position}
            />
          ) : null
        }
        onAdded={onAdded}
        onClose={close}
      />
    ) : null;
  const addButton = (kind: LineKind, label: string) =>
    editable &&
    !(editorOpen && editing?.kind === kind && editing.position === null) ? (
      <button
        type="button"
        className="button-quiet"
        onClick={() => startEditing(kind, null)}
      >
        + {label}
      </button>
    ) : null;

  return (
    <div className="space-y-8">
      <div className="space-y-4">
        <p className="text-sm print:hidden">
          <Link
            to="/designs"
            className="text-copper-700 underline underline-offset-2"
          >
            ← Designs
          </Link>
        </p>
        <div className="flex flex-wrap items-start justify-between gap-4">
          <div className="min-w-0">
            <p className="text-sm text-graphite-500">
              Design{revision.motorType ? ` · ${revision.motorType}` : ""}
            </p>
            <h1 className="text-2xl font-semibold break-words">
              {revision.name}
            </h1>
            <p className="mt-1 flex flex-wrap items-center gap-2 text-graphite-700">
              <span>Revision {revision.revision}</span>
              <StatusMark status={revision.status} />
              <span className="text-sm text-graphite-500">
                {revision.releasedAt
                  ? `released ${formatDateTime(revision.releasedAt)}`
                  : editable
                    ? "changes are saved line by line"
                    : "being worked on"}
              </span>
            </p>
            {revision.description ? (
              <p className="mt-2 max-w-3xl text-graphite-700">
                {revision.description}
              </p>
            ) : null}
          </div>
          <div className="flex flex-wrap items-start gap-2 print:hidden">
            <a
              href={`${base}/bom.csv${query}`}
              className="button-quiet"
              download
            >
              BOM as CSV
            </a>
            <Link to={`${base}/print${query}`} className="button-quiet">
              Printable BOM
            </Link>
            {editable ? (
              <ReleaseControl
                revision={revision.revision}
                warnings={costing.warnings}
              />
            ) : null}
            {canCreateBuildOrder && !draft ? (
              <CreateBuildOrderForm
                designId={revision.designId}
                revision={revision.revision}
                quantity={costQuery.quantity}
              />
            ) : null}
            {canEdit && !draft && revision.revision === latest ? (
              <NewRevisionButton next={latest + 1} />
            ) : null}
          </div>
        </div>
        <nav
          aria-label="Revisions"
          className="flex flex-wrap items-center gap-2 text-sm print:hidden"
        >
          <span className="text-graphite-500">Revisions:</span>
          {[...revisions].reverse().map((other) =>
            other.revision === revision.revision ? (
              <span
                key={other.revision}
                aria-current="page"
                className="rounded-md bg-graphite-800 px-2 py-0.5 font-medium text-white"
              >
                {other.revision} · {other.status}
              </span>
            ) : (
              <Link
                key={other.revision}
                to={`/designs/${revision.designId}/revisions/${other.revision}${query}`}
                className="rounded-md border border-graphite-300 px-2 py-0.5 text-copper-700 hover:border-copper-500"
              >
                {other.revision} · {other.status}
              </Link>
            ),
          )}
        </nav>
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

      {editable ? (
        <DesignFieldsForm revision={revision} />
      ) : (
        <DesignFieldsSummary revision={revision} />
      )}

      <section aria-labelledby="lines-heading" className="space-y-8">
        <div className="flex flex-wrap items-baseline justify-between gap-3">
          <h2 id="lines-heading" className="text-lg font-semibold">
            Bill of materials, per motor
          </h2>
          <p role="status" className="text-sm text-graphite-500">
            {busy ? "Saving and working out the figures…" : ""}
          </p>
        </div>

        <section aria-labelledby="coils-heading" className="space-y-3">
          <div>
            <h3 id="coils-heading" className="font-semibold">
              Coils
            </h3>
            <p className="text-sm text-graphite-500">
              Only the active sides lie in the field and make torque; the end
              turns add copper, loss and cost.
            </p>
          </div>
          <CoilLinesTable lines={coils} costing={costing} actions={actions} />
          <DesignWarningList
            warnings={warningsOf("coil")}
            label="Checks of the coil lines"
          />
          {editor("coil")}
          {addButton("coil", "Add a coil line")}
          <DesignInsulationCaution
            insulationClassC={revision.insulationClassC}
          />
        </section>

        <section aria-labelledby="magnets-heading" className="space-y-3">
          <h3 id="magnets-heading" className="font-semibold">
            Magnets
          </h3>
          <MagnetLinesTable
            lines={magnets}
            costing={costing}
            actions={actions}
          />
          <DesignWarningList
            warnings={warningsOf("magnet")}
            label="Checks of the magnet lines"
          />
          {editor("magnet")}
          {addButton("magnet", "Add a magnet line")}
          {magnets.length > 0 || (editorOpen && editing?.kind === "magnet") ? (
            <MagnetHandlingCaution />
          ) : null}
        </section>

        <section aria-labelledby="parts-heading" className="space-y-3">
          <h3 id="parts-heading" className="font-semibold">
            Other parts
          </h3>
          <PartLinesTable lines={parts} actions={actions} />
          {editor("part")}
          {addButton("part", "Add a part line")}
        </section>
      </section>

      <DesignCostPanel
        costing={costing}
        query={costQuery}
        lines={lines}
        torqueBasis={revision.torqueBasis}
      />
    </div>
  );
}
