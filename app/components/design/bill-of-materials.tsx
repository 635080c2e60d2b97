import { lazy, Suspense, useEffect } from "react";
import { useFetchers } from "react-router";
import type { DesignPageData } from "~/designs/design-page.server";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import { DesignInsulationCaution } from "./insulation-caution";
import type { LineKind } from "./line-editor";
import {
  CoilLinesTable,
  DesignWarningList,
  MagnetLinesTable,
  PartLinesTable,
} from "./line-tables";
import { SavedLineFigures } from "./saved-line-figures";
import { useLineEditing } from "./use-line-editing";

/**
 * The line editor (its schemas, the item picker, the coil drawing) opens only when a
 * builder asks for it: loaded with import(), not with the page, and fetched as soon as
 * an editable page has run so it is there by the first click
 * (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
const loadLineEditor = () => import("./line-editor");
const DesignLineEditor = lazy(() =>
  loadLineEditor().then((module) => ({ default: module.DesignLineEditor })),
);

/**
 * The revision's bill of materials per motor: coils, magnets and other parts, each
 * with its checks, and (on a draft a builder may edit) one line open in an editor.
 */
export function BillOfMaterials({
  lines,
  costing,
  insulationClassC,
  editable,
}: {
  lines: DesignPageData["lines"];
  costing: DesignPageData["costing"];
  insulationClassC: number;
  editable: boolean;
}) {
  const {
    editing,
    editingLine,
    editorOpen,
    startEditing,
    onAdded,
    close,
    actions,
  } = useLineEditing(lines, editable);
  useEffect(() => {
    if (editable) void loadLineEditor();
  }, [editable]);

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
      <Suspense
        key={editing.session}
        fallback={
          <p role="status" className="text-sm text-graphite-500">
            Opening the editor…
          </p>
        }
      >
        <DesignLineEditor
          formId={`design-line-${editing.session}`}
          kind={kind}
          line={editingLine}
          figures={
            editingLine ? (
              <SavedLineFigures
                costing={costing}
                position={editingLine.position}
              />
            ) : null
          }
          onAdded={onAdded}
          onClose={close}
        />
      </Suspense>
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
        <DesignInsulationCaution insulationClassC={insulationClassC} />
      </section>

      <section aria-labelledby="magnets-heading" className="space-y-3">
        <h3 id="magnets-heading" className="font-semibold">
          Magnets
        </h3>
        <MagnetLinesTable lines={magnets} costing={costing} actions={actions} />
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
  );
}
