import { formatNumber } from "~/lib/format";
/**
 * Substitutes from stock for a design revision's coil line, from the database: the wire
 * items in stock, their moving average cost, whether the line's own wire is short for the
 * open build orders, and applying a substitute (to the draft, or to a new draft revision
 * copied from a released one) in one transaction. The rules are in wire-substitutes.ts.
 *
 * A line is named by its position in the revision (1, 2, 3 …), as the costing's `coils[].line`
 * and the warnings name it (decision 037).
 */
import { and, desc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  buildOrderLines,
  buildOrders,
  designLines,
  designRevisions,
  designs,
  items,
  wireItems,
} from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  findInsulationKind,
  type ConductorKey,
} from "~/engineering/reference-data";
import { parseUnitCost } from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { wireSpecOf } from "~/stock/stocked-item-figures";
import type { CoilLine } from "./design-lines";
import {
  findRevision,
  loadRevisionLines,
  type StoredDesignLine,
} from "./design-revisions.server";
import { copyRevisionAsDraft } from "./designs.server";
import {
  DEFAULT_AREA_TOLERANCE,
  proposeWireSubstitutes,
  type StockedWire,
  type WireSubstitute,
} from "./wire-substitutes";

/** Which line: the design, its revision number and the line's position (from 1). */
export interface LineRef {
  designId: number;
  revision: number;
  position: number;
}

/** Build orders whose needs still count: not built, not cancelled (as the buying plan nets them). */
const openBuildOrderStatuses = ["draft", "reserved", "in_progress"] as const;

const unitCostOf = (text: string | null) => {
  if (text === null) return null;
  const cost = parseUnitCost(text);
  return cost > 0n ? cost : null;
};

/** The revision and its coil line at `position`; 404 for an unknown design, revision or line, 409 for another kind of line. */
async function findCoilLine(ref: LineRef) {
  const found = await findRevision(ref.designId, ref.revision);
  if (!found)
    throw new DomainError(
      404,
      `Design ${ref.designId} has no revision ${ref.revision}.`,
    );
  const lines = await loadRevisionLines(found.revision.id, found.revision);
  const line = lines.find((entry) => entry.position === ref.position);
  if (!line)
    throw new DomainError(
      404,
      `Revision ${ref.revision} has no line ${ref.position}.`,
    );
  if (line.kind !== "coil")
    throw new DomainError(
      409,
      `Line ${ref.position} is a ${line.kind} line, not a wire (coil) line: only coil lines have substitutes from stock.`,
    );
  return { found, line };
}

/** Active wire items of `conductor` with stock on hand, with their moving average cost per kg. */
async function stockedWires(conductor: ConductorKey): Promise<StockedWire[]> {
  const rows = await db
    .select({
      itemId: items.id,
      sku: items.sku,
      name: items.name,
      onHand: items.onHand,
      averageCost: items.averageCost,
      standard: wireItems.standard,
      sizeLabel: wireItems.sizeLabel,
      insulation: wireItems.insulation,
      thermalClass: wireItems.thermalClass,
    })
    .from(items)
    .innerJoin(wireItems, eq(wireItems.itemId, items.id))
    .where(
      and(
        eq(items.active, true),
        gt(items.onHand, "0"),
        eq(wireItems.conductor, conductor),
      ),
    );
  return rows.map((row) => {
    const kind = row.insulation ? findInsulationKind(row.insulation) : null;
    return {
      itemId: row.itemId,
      sku: row.sku,
      name: row.name,
      conductor,
      size: wireSpecOf(row.standard, row.sizeLabel),
      insulation: kind && kind.standard === row.standard ? kind.key : null,
      enamelledLinearMassKgPerM: null,
      thermalClassC: row.thermalClass,
      onHandKg: Number(row.onHand),
      unitCost: unitCostOf(row.averageCost),
    };
  });
}

async function averageCostOf(itemId: number) {
  const [row] = await db
    .select({ averageCost: items.averageCost })
    .from(items)
    .where(eq(items.id, itemId));
  return unitCostOf(row?.averageCost ?? null);
}

/** The substitutes of a line (closest area first) with the line's own figures. */
async function substitutesOf(
  found: NonNullable<Awaited<ReturnType<typeof findRevision>>>,
  line: StoredDesignLine & CoilLine,
  tolerance: number,
): Promise<WireSubstitute[]> {
  const [candidates, lineUnitCost] = await Promise.all([
    stockedWires(line.wire.conductor),
    averageCostOf(line.wire.itemId),
  ]);
  return proposeWireSubstitutes({
    line,
    lineUnitCost,
    // The rated current is the RMS phase current; each of the parallel paths carries 1/a.
    ratedCurrentA:
      Number(found.revision.ratedCurrentA) / found.revision.parallelPaths,
    insulationClassC: found.revision.insulationClassC,
    tolerance,
    candidates,
  });
}

/** GET …/lines/:line/substitutes: the line's wire and its substitutes from stock. */
export async function listLineSubstitutes(
  ref: LineRef,
  tolerance = DEFAULT_AREA_TOLERANCE,
) {
  const { found, line } = await findCoilLine(ref);
  return {
    line: {
      position: line.position,
      sku: line.wire.sku,
      strands: line.strandsInHand,
    },
    tolerancePercent: tolerance * 100,
    substitutes: await substitutesOf(found, line, tolerance),
  };
}

/**
 * Applies a substitute to a coil line: on a draft revision the line changes in place (200);
 * on a released one a new draft revision is made, a copy with that line's wire and strands
 * changed (201). One transaction; refused with 409 and nothing written when the design has
 * a draft already (a released revision), the choice is not among the current substitutes,
 * or the line changed meanwhile.
 */
export async function applyWireSubstitute(
  ref: LineRef,
  choice: { sku: string; strands: number },
  tolerance = DEFAULT_AREA_TOLERANCE,
): Promise<{
  status: 200 | 201;
  revision: number;
  revisionId: number;
  /** The changed line's id (in the new revision when one was made). */
  lineId: number;
}> {
  const { found, line } = await findCoilLine(ref);
  const substitutes = await substitutesOf(found, line, tolerance);
  const chosen = substitutes.find(
    (entry) =>
      entry.sku.toLowerCase() === choice.sku.toLowerCase() &&
      entry.strands === choice.strands,
  );
  if (!chosen)
    throw new DomainError(
      409,
      substitutes.length === 0
        ? `Nothing in stock can stand in for ${line.wire.sku} on line ${ref.position} within ±${formatPercent(tolerance)} of its copper area that still fits the slot.`
        : `${choice.strands} × ${choice.sku} is not among the substitutes for line ${ref.position} now (out of stock, outside ±${formatPercent(tolerance)} of the copper area, or not fitting the slot): choose one of ${substitutes
            .slice(0, 5)
            .map((entry) => `${entry.strands} × ${entry.sku}`)
            .join(", ")}.`,
    );

  return writeTransaction(async (tx) => {
    await tx
      .select({ id: designs.id })
      .from(designs)
      .where(eq(designs.id, ref.designId))
      .for("update");
    const [revision] = await tx
      .select()
      .from(designRevisions)
      .where(eq(designRevisions.id, found.revision.id))
      .for("update");
    const [stored] = await tx
      .select({
        itemId: designLines.itemId,
        strands: designLines.strandsInHand,
      })
      .from(designLines)
      .where(eq(designLines.id, line.id));
    if (
      !revision ||
      !stored ||
      stored.itemId !== line.wire.itemId ||
      stored.strands !== line.strandsInHand ||
      revision.status !== found.revision.status
    )
      throw new DomainError(
        409,
        "This revision or line was changed meanwhile: reload and choose again.",
      );
    const change = { itemId: chosen.itemId, strandsInHand: chosen.strands };

    if (revision.status === "draft") {
      await tx
        .update(designLines)
        .set(change)
        .where(eq(designLines.id, line.id));
      await tx
        .update(designRevisions)
        .set({ draftSaves: sql`${designRevisions.draftSaves} + 1` })
        .where(eq(designRevisions.id, revision.id));
      return {
        status: 200,
        revision: revision.revision,
        revisionId: revision.id,
        lineId: line.id,
      };
    }

    const [latest] = await tx
      .select({
        revision: designRevisions.revision,
        status: designRevisions.status,
      })
      .from(designRevisions)
      .where(eq(designRevisions.designId, ref.designId))
      .orderBy(desc(designRevisions.revision))
      .limit(1);
    const [draft] = await tx
      .select({ revision: designRevisions.revision })
      .from(designRevisions)
      .where(
        and(
          eq(designRevisions.designId, ref.designId),
          eq(designRevisions.status, "draft"),
        ),
      )
      .limit(1);
    if (draft)
      throw new DomainError(
        409,
        `Revision ${draft.revision} of this design is a draft already: apply the substitute there, or release it first.`,
      );
    const next = latest!.revision + 1;
    const revisionId = await copyRevisionAsDraft(tx, revision, next, (row) =>
      row.id === line.id ? { ...row, ...change } : row,
    );
    const [copied] = await tx
      .select({ id: designLines.id })
      .from(designLines)
      .where(
        and(
          eq(designLines.revisionId, revisionId),
          eq(designLines.position, line.position),
        ),
      );
    return { status: 201, revision: next, revisionId, lineId: copied!.id };
  });
}

const formatPercent = (fraction: number) =>
  `${formatNumber(fraction * 100, 2)} %`;

/** A wire short for the open build orders: still to hold beyond what is available. */
export interface WireShortage {
  /** Still to hold for open build orders (required − issued − held), kg. */
  stillNeededKg: number;
  /** On hand − reserved, kg. */
  availableKg: number;
}

/**
 * Items that open build orders still need more of than is available (the netting the
 * buying plan does, without purchase orders): keyed by item id; absent when not short.
 */
export async function wireShortages(
  itemIds: readonly number[],
): Promise<Map<number, WireShortage>> {
  if (itemIds.length === 0) return new Map();
  const [needRows, itemRows] = await Promise.all([
    db
      .select({
        itemId: buildOrderLines.itemId,
        stillNeeded: sql<string>`SUM(GREATEST(${buildOrderLines.required} - ${buildOrderLines.issued} - ${buildOrderLines.reserved}, 0))`,
      })
      .from(buildOrderLines)
      .innerJoin(buildOrders, eq(buildOrders.id, buildOrderLines.orderId))
      .where(
        and(
          inArray(buildOrders.status, openBuildOrderStatuses),
          inArray(buildOrderLines.itemId, [...itemIds]),
        ),
      )
      .groupBy(buildOrderLines.itemId),
    db
      .select({ id: items.id, available: items.available })
      .from(items)
      .where(inArray(items.id, [...itemIds])),
  ]);
  const available = new Map(
    itemRows.map((row) => [row.id, Number(row.available ?? 0)]),
  );
  const short = new Map<number, WireShortage>();
  for (const row of needRows) {
    const stillNeededKg = Number(row.stillNeeded);
    const availableKg = available.get(row.itemId) ?? 0;
    if (stillNeededKg > availableKg)
      short.set(row.itemId, { stillNeededKg, availableKg });
  }
  return short;
}

/** Every coil line of a revision with its substitutes and whether its wire is short, for the design page. */
export async function loadSubstitutePanels(
  ids: { designId: number; revision: number },
  tolerance = DEFAULT_AREA_TOLERANCE,
) {
  const found = await findRevision(ids.designId, ids.revision);
  if (!found) return [];
  const lines = (
    await loadRevisionLines(found.revision.id, found.revision)
  ).filter((line): line is StoredDesignLine & CoilLine => line.kind === "coil");
  const shortages = await wireShortages(lines.map((line) => line.wire.itemId));
  return Promise.all(
    lines.map(async (line) => ({
      position: line.position,
      sku: line.wire.sku,
      strands: line.strandsInHand,
      shortage: shortages.get(line.wire.itemId) ?? null,
      substitutes: await substitutesOf(found, line, tolerance),
    })),
  );
}

export type SubstitutePanel = Awaited<
  ReturnType<typeof loadSubstitutePanels>
>[number];
