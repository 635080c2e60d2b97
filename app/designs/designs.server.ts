/**
 * Creating and changing designs and their revisions. A draft revision is
 * edited (its fields and its whole list of lines); releasing locks it for
 * good; a new revision starts as a copy of the latest one. Every change locks
 * the revision row first, so a release and an edit never cross.
 */
import { and, asc, desc, eq, inArray, like, or, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  designLines,
  designRevisions,
  designs,
  items,
  magnetItems,
  wireItems,
} from "~/db/schema";
import { DomainError } from "~/lib/domain-error";
import { containsPattern } from "~/lib/list-filters";
import {
  windingFieldIssue,
  slotLinerTooLargeMessage,
  type DesignLineInput,
  type NewDesign,
  type RevisionFields,
} from "./design-schemas";

export type Transaction = Parameters<Parameters<typeof db.transaction>[0]>[0];

const decimalText = (value: number | undefined | null, decimals: number) =>
  value === undefined || value === null ? null : value.toFixed(decimals);

/** Revision fields as the table stores them. */
function revisionColumns(fields: Partial<RevisionFields>) {
  const columns: Partial<typeof designRevisions.$inferInsert> = {};
  if ("poles" in fields) columns.poles = fields.poles;
  if ("slots" in fields) columns.slots = fields.slots;
  if ("ratedCurrentA" in fields)
    columns.ratedCurrentA = decimalText(fields.ratedCurrentA, 3)!;
  if ("ratedTorqueNm" in fields)
    columns.ratedTorqueNm = decimalText(fields.ratedTorqueNm, 4);
  if ("torqueBasis" in fields) columns.torqueBasis = fields.torqueBasis;
  if ("insulationClassC" in fields)
    columns.insulationClassC = fields.insulationClassC;
  if ("slotAreaMm2" in fields)
    columns.slotAreaMm2 = decimalText(fields.slotAreaMm2, 2);
  if ("slotLinerAreaMm2" in fields)
    columns.slotLinerAreaMm2 = decimalText(fields.slotLinerAreaMm2, 2);
  if ("coilSidesPerSlot" in fields)
    columns.coilSidesPerSlot = fields.coilSidesPerSlot;
  if ("phases" in fields) columns.phases = fields.phases;
  if ("windingLayers" in fields) columns.windingLayers = fields.windingLayers;
  if ("phaseConnection" in fields)
    columns.phaseConnection = fields.phaseConnection;
  if ("parallelPaths" in fields) columns.parallelPaths = fields.parallelPaths;
  if ("ratedSpeedRpm" in fields)
    columns.ratedSpeedRpm = decimalText(fields.ratedSpeedRpm, 1);
  if ("airGapRadiusMm" in fields)
    columns.airGapRadiusMm = decimalText(fields.airGapRadiusMm, 3);
  if ("airGapFluxDensityT" in fields)
    columns.airGapFluxDensityT = decimalText(fields.airGapFluxDensityT, 4);
  if ("poleCoverage" in fields)
    columns.poleCoverage = decimalText(fields.poleCoverage, 3);
  if ("notes" in fields) columns.notes = fields.notes ?? "";
  return columns;
}

const windingKeys = [
  "slots",
  "poles",
  "phases",
  "windingLayers",
  "phaseConnection",
] as const;

type WindingFields = Pick<RevisionFields, (typeof windingKeys)[number]>;

/** 400 beside its field for a winding that cannot be balanced (see `windingFieldIssue`). */
function refuseUnbalancedWinding(fields: WindingFields): void {
  const issue = windingFieldIssue(fields);
  if (issue) throw new DomainError(400, issue.message, issue.field);
}

/**
 * The winding a revision will have after a change that touches it, refused when it cannot
 * be balanced. A change to other fields leaves a stored winding alone.
 */
function checkChangedWinding(
  stored: WindingFields,
  change: Partial<RevisionFields>,
): void {
  if (!windingKeys.some((key) => key in change)) return;
  refuseUnbalancedWinding({
    slots: change.slots ?? stored.slots,
    poles: change.poles ?? stored.poles,
    phases: change.phases ?? stored.phases,
    windingLayers: change.windingLayers ?? stored.windingLayers,
    phaseConnection: change.phaseConnection ?? stored.phaseConnection,
  });
}

/** Designs by name, each with its revisions (newest first), a page at a time. */
export async function listDesigns(options: {
  page: number;
  perPage: number;
  search?: string;
}) {
  // Part of the name or the motor type; designs are few (hundreds), so the name index is scanned.
  const where = options.search
    ? or(
        like(designs.name, containsPattern(options.search)),
        like(designs.motorType, containsPattern(options.search)),
      )
    : undefined;
  const page = await db
    .select({
      id: designs.id,
      name: designs.name,
      motorType: designs.motorType,
      description: designs.description,
    })
    .from(designs)
    .where(where)
    .orderBy(asc(designs.name))
    .limit(options.perPage)
    .offset((options.page - 1) * options.perPage);
  const [{ total }] = (await db
    .select({ total: sql<number>`COUNT(*)` })
    .from(designs)
    .where(where)) as [{ total: number }];
  const revisions =
    page.length === 0
      ? []
      : await db
          .select({
            designId: designRevisions.designId,
            revision: designRevisions.revision,
            status: designRevisions.status,
            ratedTorqueNm: designRevisions.ratedTorqueNm,
            torqueBasis: designRevisions.torqueBasis,
          })
          .from(designRevisions)
          .where(
            inArray(
              designRevisions.designId,
              page.map((design) => design.id),
            ),
          )
          .orderBy(desc(designRevisions.revision));
  return {
    total: Number(total),
    designs: page.map((design) => ({
      ...design,
      revisions: revisions
        .filter((revision) => revision.designId === design.id)
        .map(({ revision, status, ratedTorqueNm, torqueBasis }) => ({
          revision,
          status,
          ratedTorqueNm: ratedTorqueNm === null ? null : Number(ratedTorqueNm),
          torqueBasis,
        })),
    })),
  };
}

/** Creates a design with revision 1 as a draft (no lines yet). */
export async function createDesign(
  input: NewDesign,
  userId: string,
): Promise<{ id: number; revision: number }> {
  const [existing] = await db
    .select({ id: designs.id })
    .from(designs)
    .where(eq(designs.name, input.name))
    .limit(1);
  if (existing)
    throw new DomainError(
      409,
      `A design named "${input.name}" already exists.`,
      "name",
    );
  refuseUnbalancedWinding(input);
  return writeTransaction(async (tx) => {
    const [created] = await tx
      .insert(designs)
      .values({
        name: input.name,
        description: input.description,
        motorType: input.motorType,
        userId,
      })
      .$returningId();
    await tx.insert(designRevisions).values({
      ...(revisionColumns(input) as typeof designRevisions.$inferInsert),
      designId: created!.id,
      revision: 1,
      status: "draft",
    });
    return { id: created!.id, revision: 1 };
  });
}

/** Locks a revision row; 404 when missing, 409 when released (a released revision never changes). */
async function lockDraft(tx: Transaction, designId: number, revision: number) {
  const [found] = await tx
    .select({
      id: designRevisions.id,
      status: designRevisions.status,
      slots: designRevisions.slots,
      poles: designRevisions.poles,
      phases: designRevisions.phases,
      windingLayers: designRevisions.windingLayers,
      phaseConnection: designRevisions.phaseConnection,
    })
    .from(designRevisions)
    .where(
      and(
        eq(designRevisions.designId, designId),
        eq(designRevisions.revision, revision),
      ),
    )
    .for("update")
    .limit(1);
  if (!found)
    throw new DomainError(
      404,
      `Design ${designId} has no revision ${revision}.`,
    );
  if (found.status !== "draft")
    throw new DomainError(
      409,
      `Revision ${revision} is released and cannot be changed. Start a new revision to make changes.`,
    );
  return found;
}

/** The catalogue items of the lines by SKU, checked against each line's kind. */
async function resolveLineItems(
  tx: Transaction,
  lines: readonly DesignLineInput[],
): Promise<number[]> {
  const skus = [...new Set(lines.map((line) => line.sku))];
  const found =
    skus.length === 0
      ? []
      : await tx
          .select({
            id: items.id,
            sku: items.sku,
            kind: items.kind,
            active: items.active,
            isWire: wireItems.itemId,
            isMagnet: magnetItems.itemId,
          })
          .from(items)
          .leftJoin(wireItems, eq(wireItems.itemId, items.id))
          .leftJoin(magnetItems, eq(magnetItems.itemId, items.id))
          .where(inArray(items.sku, skus));
  const bySku = new Map(found.map((item) => [item.sku.toLowerCase(), item]));
  return lines.map((line, index) => {
    const item = bySku.get(line.sku.toLowerCase());
    const field = `lines[${index}].sku`;
    if (!item || !item.active)
      throw new DomainError(
        400,
        `Line ${index + 1}: no active item with SKU "${line.sku}".`,
        field,
      );
    if (line.kind === "coil" && item.isWire === null)
      throw new DomainError(
        400,
        `Line ${index + 1}: ${item.sku} is not a magnet wire item; a coil is wound from wire.`,
        field,
      );
    if (line.kind === "magnet" && item.isMagnet === null)
      throw new DomainError(
        400,
        `Line ${index + 1}: ${item.sku} is not a magnet item.`,
        field,
      );
    return item.id;
  });
}

function lineColumns(line: DesignLineInput) {
  switch (line.kind) {
    case "coil":
      return {
        turns: line.turns,
        strandsInHand: line.strandsInHand,
        activeLengthMm: line.activeLengthMm.toFixed(2),
        endTurnLengthMm: line.endTurnLengthMm.toFixed(2),
        leadLengthMm: line.leadLengthMm.toFixed(2),
        coilsPerMotor: line.coilsPerMotor,
        scrapPercent: line.scrapPercent.toFixed(2),
        operatingTemperatureC: line.operatingTemperatureC.toFixed(1),
      };
    case "magnet":
      return {
        piecesPerMotor: line.piecesPerMotor,
        operatingTemperatureC: decimalText(line.operatingTemperatureC, 1),
      };
    case "part":
      return { quantityPerMotor: line.quantityPerMotor.toFixed(3) };
  }
}

/** 400 when the stored liner area (after a change of either field) is not below the slot area. */
async function refuseLinerFillingSlot(tx: Transaction, revisionId: number) {
  const [row] = await tx
    .select({
      slot: designRevisions.slotAreaMm2,
      liner: designRevisions.slotLinerAreaMm2,
    })
    .from(designRevisions)
    .where(eq(designRevisions.id, revisionId));
  if (row?.slot && row.liner && Number(row.liner) >= Number(row.slot))
    throw new DomainError(400, slotLinerTooLargeMessage, "slotLinerAreaMm2");
}

/**
 * Changes a draft revision: the given fields, and (when `lines` is given) its
 * whole list of lines. 409 for a released revision; nothing is written then.
 */
export async function updateDraftRevision(
  designId: number,
  revision: number,
  change: Partial<RevisionFields> & {
    lines?: DesignLineInput[];
    /** The line ids the caller read: 409 when the lines changed since (every save gives new ids). */
    expectLineIds?: number[];
  },
): Promise<void> {
  await writeTransaction(async (tx) => {
    const draft = await lockDraft(tx, designId, revision);
    const { lines, expectLineIds, ...fields } = change;
    checkChangedWinding(draft, fields);
    if (expectLineIds) {
      const now = await tx
        .select({ id: designLines.id })
        .from(designLines)
        .where(eq(designLines.revisionId, draft.id));
      const same = (a: number[], b: number[]) =>
        a.length === b.length &&
        [...a]
          .sort((x, y) => x - y)
          .every((id, i) => id === [...b].sort((x, y) => x - y)[i]);
      if (
        !same(
          now.map((row) => row.id),
          expectLineIds,
        )
      )
        throw new DomainError(
          409,
          "The lines were changed by someone else meanwhile: reload the page and make your change again.",
        );
    }
    // Written on every save, lines only or not: see designRevisions.draftSaves.
    await tx
      .update(designRevisions)
      .set({
        ...revisionColumns(fields),
        draftSaves: sql`${designRevisions.draftSaves} + 1`,
      })
      .where(eq(designRevisions.id, draft.id));
    await refuseLinerFillingSlot(tx, draft.id);
    if (lines) {
      const itemIds = await resolveLineItems(tx, lines);
      await tx.delete(designLines).where(eq(designLines.revisionId, draft.id));
      if (lines.length > 0)
        await tx.insert(designLines).values(
          lines.map((line, index) => ({
            revisionId: draft.id,
            position: index + 1,
            kind: line.kind,
            itemId: itemIds[index]!,
            ...lineColumns(line),
          })),
        );
    }
  });
}

/** Releases a draft: from now on it is read-only and can be built. */
export async function releaseRevision(
  designId: number,
  revision: number,
  userId: string,
): Promise<void> {
  await writeTransaction(async (tx) => {
    const draft = await lockDraft(tx, designId, revision);
    const [{ lines }] = (await tx
      .select({ lines: sql<number>`COUNT(*)` })
      .from(designLines)
      .where(eq(designLines.revisionId, draft.id))) as [{ lines: number }];
    if (Number(lines) === 0)
      throw new DomainError(
        409,
        "A revision without lines cannot be released: add its coils, magnets and parts first.",
      );
    await tx
      .update(designRevisions)
      .set({ status: "released", releasedAt: new Date(), releasedBy: userId })
      .where(eq(designRevisions.id, draft.id));
  });
}

type LineRow = typeof designLines.$inferSelect;

/**
 * Inserts revision `next` of the source's design as a draft copy of `source`: its fields and
 * its lines, each line through `changeLine` (unchanged by default). Returns the new row's id.
 */
export async function copyRevisionAsDraft(
  tx: Transaction,
  source: typeof designRevisions.$inferSelect,
  next: number,
  changeLine: (line: LineRow) => LineRow = (line) => line,
): Promise<number> {
  const [created] = await tx
    .insert(designRevisions)
    .values({
      ...source,
      id: undefined,
      releasedAt: null,
      releasedBy: null,
      draftSaves: 0,
      createdAt: new Date(),
      revision: next,
      status: "draft",
    })
    .$returningId();
  const lines = await tx
    .select()
    .from(designLines)
    .where(eq(designLines.revisionId, source.id));
  if (lines.length > 0)
    await tx.insert(designLines).values(
      lines.map(changeLine).map(({ id: _id, ...line }) => ({
        ...line,
        revisionId: created!.id,
      })),
    );
  return created!.id;
}

/** Starts the next revision as a draft copy of the latest one; 409 while a draft exists. */
export async function startNewRevision(
  designId: number,
): Promise<{ revision: number }> {
  return writeTransaction(async (tx) => {
    const [design] = await tx
      .select({ id: designs.id })
      .from(designs)
      .where(eq(designs.id, designId))
      .for("update")
      .limit(1);
    if (!design) throw new DomainError(404, `No design ${designId}.`);
    const [latest] = await tx
      .select()
      .from(designRevisions)
      .where(eq(designRevisions.designId, designId))
      .orderBy(desc(designRevisions.revision))
      .limit(1);
    if (!latest)
      throw new DomainError(404, `Design ${designId} has no revisions.`);
    if (latest.status === "draft")
      throw new DomainError(
        409,
        `Revision ${latest.revision} is still a draft: change it, or release it before starting another.`,
      );
    const next = latest.revision + 1;
    await copyRevisionAsDraft(tx, latest, next);
    return { revision: next };
  });
}

/** One design with all its revisions, newest first; null when missing. */
export async function listDesignRevisions(designId: number) {
  const [design] = await db
    .select({
      id: designs.id,
      name: designs.name,
      description: designs.description,
      motorType: designs.motorType,
    })
    .from(designs)
    .where(eq(designs.id, designId))
    .limit(1);
  if (!design) return null;
  const revisions = await db
    .select({
      revision: designRevisions.revision,
      status: designRevisions.status,
      ratedTorqueNm: designRevisions.ratedTorqueNm,
      torqueBasis: designRevisions.torqueBasis,
      releasedAt: designRevisions.releasedAt,
    })
    .from(designRevisions)
    .where(eq(designRevisions.designId, designId))
    .orderBy(desc(designRevisions.revision));
  return {
    ...design,
    revisions: revisions.map((revision) => ({
      ...revision,
      ratedTorqueNm:
        revision.ratedTorqueNm === null ? null : Number(revision.ratedTorqueNm),
      releasedAt: revision.releasedAt?.toISOString() ?? null,
    })),
  };
}
