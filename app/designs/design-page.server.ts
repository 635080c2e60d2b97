/**
 * What the design page, its printable BOM and its CSV export read: the
 * revision's fields, its lines with the figures the page shows beside them,
 * the other revisions, and the costing for a build quantity and price basis.
 */
import { costRevision, type RevisionCosting } from "./design-costing.server";
import { coilSlotFill } from "./design-checks";
import { designWireBareDiameterMm, type CoilLine } from "./design-lines";
import type { CostQuery, StoredLineInput } from "./design-page";
import {
  findRevision,
  lineView,
  loadRevisionLines,
  revisionView,
  type StoredDesignLine,
} from "./design-revisions.server";
import type { DesignLineInput } from "./design-schemas";
import { listDesignRevisions } from "./designs.server";

/** A stored line as the line schemas (and so the editor's fields) take it. */
export function lineInputOf(line: StoredDesignLine): DesignLineInput {
  const view = lineView(line);
  switch (view.kind) {
    case "coil":
      return {
        kind: "coil",
        sku: view.sku,
        turns: view.turns,
        strandsInHand: view.strandsInHand,
        activeLengthMm: view.activeLengthMm,
        endTurnLengthMm: view.endTurnLengthMm,
        leadLengthMm: view.leadLengthMm,
        coilsPerMotor: view.coilsPerMotor,
        scrapPercent: view.scrapPercent,
        operatingTemperatureC: view.operatingTemperatureC,
      };
    case "magnet":
      return {
        kind: "magnet",
        sku: view.sku,
        piecesPerMotor: view.piecesPerMotor,
        ...(view.operatingTemperatureC === null
          ? {}
          : { operatingTemperatureC: view.operatingTemperatureC }),
      };
    case "part":
      return {
        kind: "part",
        sku: view.sku,
        quantityPerMotor: view.quantityPerMotor,
      };
  }
}

/** The lines of a revision with their current ids, as the page's action changes them. */
export async function storedLineInputs(
  revisionId: number,
): Promise<StoredLineInput[]> {
  return (await loadRevisionLines(revisionId)).map((line) => ({
    id: line.id,
    input: lineInputOf(line),
  }));
}

/** A coil line's slot fill as the page and the API show it; null without a slot area. */
export function slotFillView(line: CoilLine) {
  const fill = coilSlotFill(line);
  if (!fill) return null;
  return {
    copperFill: fill.copperFill,
    grossFill: fill.grossFill,
    judgedOn: fill.judgedOn,
    fits: fill.fits,
    note: fill.note,
  };
}

/** One line as the page shows it: what the builder entered, and what the item brings. */
function pageLine(line: StoredDesignLine) {
  const common = {
    id: line.id,
    position: line.position,
    itemName: line.itemName,
    input: lineInputOf(line),
  };
  switch (line.kind) {
    case "coil":
      return {
        ...common,
        kind: "coil" as const,
        wire: {
          thermalClassC: line.wire.thermalClassC,
          conductor: line.wire.conductor,
          bareDiameterMm: designWireBareDiameterMm(line.wire),
        },
        /** Copper fill of the slot (bare conductor); null without a slot area. */
        fillFactor: coilSlotFill(line)?.copperFill ?? null,
        /** Copper and gross fill (over the enamel) with what the limits were judged on; null without a slot area. */
        slotFill: slotFillView(line),
      };
    case "magnet": {
      const limit = line.magnet.maxWorkingTemperatureC;
      return {
        ...common,
        kind: "magnet" as const,
        magnet: {
          gradeName: line.magnet.gradeName,
          massPerPieceKg: line.magnet.massPerPieceKg,
          massPerMotorKg: line.magnet.massPerPieceKg * line.piecesPerMotor,
          maxWorkingTemperatureC: Number.isFinite(limit) ? limit : null,
        },
      };
    }
    case "part":
      return { ...common, kind: "part" as const, unit: line.part.unit };
  }
}

export type DesignPageLine = ReturnType<typeof pageLine>;

/** Today in UTC, the day prices are looked up for. */
export function costingDay(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** The design revision with its lines, revisions and costing; null when it does not exist. */
export async function loadDesignPage(
  ids: { designId: number; revision: number },
  query: Pick<CostQuery, "quantity" | "basis">,
) {
  const found = await findRevision(ids.designId, ids.revision);
  if (!found) return null;
  const [stored, history] = await Promise.all([
    loadRevisionLines(found.revision.id),
    listDesignRevisions(ids.designId),
  ]);
  const costing: RevisionCosting = await costRevision({
    revision: found.revision,
    lines: stored,
    quantity: query.quantity,
    basis: query.basis,
    date: costingDay(),
  });
  return {
    revision: revisionView(found.design, found.revision),
    revisions: (history?.revisions ?? []).map(
      ({ revision, status, releasedAt }) => ({ revision, status, releasedAt }),
    ),
    lines: stored.map(pageLine),
    costing,
  };
}

export type DesignPageData = NonNullable<
  Awaited<ReturnType<typeof loadDesignPage>>
>;
