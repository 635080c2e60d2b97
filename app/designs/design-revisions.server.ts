/**
 * Reading design revisions from the database as the pure design modules take
 * them: the revision's figures and its lines (coil, magnet, part) joined to
 * their catalogue items.
 */
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  designLines,
  designRevisions,
  designs,
  items,
  magnetGrades,
  magnetItems,
  wireItems,
} from "~/db/schema";
import {
  findInsulationKind,
  type ConductorKey,
  type InsulationKey,
} from "~/engineering/reference-data";
import { parseExactDecimal } from "~/pricing/money";
import { magnetGradeFromRow } from "~/reference/magnet-grades.server";
import {
  magnetShapeOf,
  magnetStockFigures,
  wireSpecOf,
} from "~/stock/stocked-item-figures";
import type { DesignLine } from "./design-lines";

export type RevisionRow = typeof designRevisions.$inferSelect;

/** A design line as stored, with its id and position (for editing). */
export type StoredDesignLine = DesignLine & {
  id: number;
  position: number;
  itemName: string;
};

// The two reads every costing and design page makes, built once (Drizzle prepares the
// SQL text a single time; each call only fills in the ids).
const revisionByNumber = db
  .select({
    design: {
      id: designs.id,
      name: designs.name,
      description: designs.description,
      motorType: designs.motorType,
    },
    revision: designRevisions,
  })
  .from(designRevisions)
  .innerJoin(designs, eq(designs.id, designRevisions.designId))
  .where(
    and(
      eq(designRevisions.designId, sql.placeholder("designId")),
      eq(designRevisions.revision, sql.placeholder("revision")),
    ),
  )
  .limit(1)
  .prepare();

/** The lines with their items and, for magnets, their grade: one query. */
const linesOfRevision = db
  .select({
    line: designLines,
    item: {
      sku: items.sku,
      name: items.name,
      unit: items.unit,
    },
    wire: {
      conductor: wireItems.conductor,
      standard: wireItems.standard,
      sizeLabel: wireItems.sizeLabel,
      thermalClass: wireItems.thermalClass,
      insulation: wireItems.insulation,
    },
    magnet: {
      gradeKey: magnetItems.gradeKey,
      shape: magnetItems.shape,
      dimensionsMm: magnetItems.dimensionsMm,
    },
    grade: magnetGrades,
  })
  .from(designLines)
  .innerJoin(items, eq(items.id, designLines.itemId))
  .leftJoin(wireItems, eq(wireItems.itemId, designLines.itemId))
  .leftJoin(magnetItems, eq(magnetItems.itemId, designLines.itemId))
  .leftJoin(magnetGrades, eq(magnetGrades.key, magnetItems.gradeKey))
  .where(eq(designLines.revisionId, sql.placeholder("revisionId")))
  .orderBy(asc(designLines.position))
  .prepare();

/** The revision of a design by its number, with the design's name; null when either is missing. */
export async function findRevision(designId: number, revision: number) {
  const [found] = await revisionByNumber.execute({ designId, revision });
  return found ?? null;
}

const optionalNumber = (value: string | null): number | null =>
  value === null ? null : Number(value);

/** The catalogue's insulation when it is a known grade or build of the wire's standard, else null. */
function insulationOf(
  standard: string,
  insulation: string | null,
): InsulationKey | null {
  const kind = insulation === null ? undefined : findInsulationKind(insulation);
  return kind && kind.standard === standard ? kind.key : null;
}

/** The lines of a revision in their order, as the design calculations take them. */
export async function loadRevisionLines(
  revisionId: number,
  /** The revision's slot figures when the caller has them (saves a query). */
  known?: Pick<
    RevisionRow,
    "slotAreaMm2" | "slotLinerAreaMm2" | "coilSidesPerSlot"
  >,
): Promise<StoredDesignLine[]> {
  const [revision] = known
    ? [known]
    : await db
        .select({
          slotAreaMm2: designRevisions.slotAreaMm2,
          slotLinerAreaMm2: designRevisions.slotLinerAreaMm2,
          coilSidesPerSlot: designRevisions.coilSidesPerSlot,
        })
        .from(designRevisions)
        .where(eq(designRevisions.id, revisionId))
        .limit(1);
  if (!revision) return [];
  const rows = await linesOfRevision.execute({ revisionId });
  const slotArea = optionalNumber(revision.slotAreaMm2);
  const slotLinerArea = optionalNumber(revision.slotLinerAreaMm2);

  return rows.map(
    ({ line, item, wire, magnet, grade: gradeRow }): StoredDesignLine => {
      const common = {
        id: line.id,
        position: line.position,
        itemName: item.name,
      };
      const ref = { itemId: line.itemId, sku: item.sku };
      if (line.kind === "coil" && wire) {
        return {
          ...common,
          kind: "coil",
          wire: {
            ...ref,
            conductor: wire.conductor as ConductorKey,
            size: wireSpecOf(wire.standard, wire.sizeLabel),
            enamelledLinearMassKgPerM: null,
            thermalClassC: wire.thermalClass,
            insulation: insulationOf(wire.standard, wire.insulation),
          },
          turns: line.turns!,
          strandsInHand: line.strandsInHand!,
          activeLengthMm: Number(line.activeLengthMm),
          endTurnLengthMm: Number(line.endTurnLengthMm),
          leadLengthMm: Number(line.leadLengthMm),
          coilsPerMotor: line.coilsPerMotor!,
          scrapPercent: Number(line.scrapPercent),
          operatingTemperatureC: Number(line.operatingTemperatureC),
          slot:
            slotArea === null
              ? null
              : {
                  areaMm2: slotArea,
                  linerAreaMm2: slotLinerArea,
                  coilSidesPerSlot: revision.coilSidesPerSlot,
                },
        };
      }
      if (line.kind === "magnet" && magnet) {
        // The database matches keys ignoring case; the grade is the item's only when spelt alike.
        const grade =
          gradeRow && gradeRow.key === magnet.gradeKey
            ? magnetGradeFromRow(gradeRow)
            : undefined;
        const shape = magnetShapeOf(magnet.shape, magnet.dimensionsMm);
        const massPerPieceKg =
          grade && shape
            ? magnetStockFigures({ grade, shape, pieces: 1 }).massPerPieceKg
            : 0;
        return {
          ...common,
          kind: "magnet",
          magnet: {
            ...ref,
            gradeName: grade?.name ?? magnet.gradeKey,
            massPerPieceKg,
            maxWorkingTemperatureC: grade?.maxWorkingTemperatureC ?? Infinity,
          },
          piecesPerMotor: line.piecesPerMotor!,
          operatingTemperatureC: optionalNumber(line.operatingTemperatureC),
        };
      }
      return {
        ...common,
        kind: "part",
        part: { ...ref, unit: item.unit },
        quantityPerMotor: parseExactDecimal(line.quantityPerMotor ?? "0"),
      };
    },
  );
}

/** A stored line as the API and the editor show it (the same fields the line schemas take). */
export function lineView(line: StoredDesignLine) {
  switch (line.kind) {
    case "coil":
      return {
        kind: line.kind,
        sku: line.wire.sku,
        itemName: line.itemName,
        turns: line.turns,
        strandsInHand: line.strandsInHand,
        activeLengthMm: line.activeLengthMm,
        endTurnLengthMm: line.endTurnLengthMm,
        leadLengthMm: line.leadLengthMm,
        coilsPerMotor: line.coilsPerMotor,
        scrapPercent: line.scrapPercent,
        operatingTemperatureC: line.operatingTemperatureC,
      };
    case "magnet":
      return {
        kind: line.kind,
        sku: line.magnet.sku,
        itemName: line.itemName,
        piecesPerMotor: line.piecesPerMotor,
        operatingTemperatureC: line.operatingTemperatureC,
      };
    case "part":
      return {
        kind: line.kind,
        sku: line.part.sku,
        itemName: line.itemName,
        unit: line.part.unit,
        quantityPerMotor: Number(
          `${line.quantityPerMotor.digits}e-${line.quantityPerMotor.decimals}`,
        ),
      };
  }
}

/** A revision's fields as the API shows them (DECIMAL text → numbers). */
export function revisionView(
  design: { id: number; name: string; description: string; motorType: string },
  revision: RevisionRow,
) {
  return {
    designId: design.id,
    name: design.name,
    description: design.description,
    motorType: design.motorType,
    revision: revision.revision,
    status: revision.status,
    poles: revision.poles,
    slots: revision.slots,
    ratedCurrentA: Number(revision.ratedCurrentA),
    ratedTorqueNm: optionalNumber(revision.ratedTorqueNm),
    torqueBasis: revision.torqueBasis,
    insulationClassC: revision.insulationClassC,
    slotAreaMm2: optionalNumber(revision.slotAreaMm2),
    slotLinerAreaMm2: optionalNumber(revision.slotLinerAreaMm2),
    coilSidesPerSlot: revision.coilSidesPerSlot,
    phases: revision.phases,
    windingLayers: revision.windingLayers,
    phaseConnection: revision.phaseConnection,
    parallelPaths: revision.parallelPaths,
    ratedSpeedRpm: optionalNumber(revision.ratedSpeedRpm),
    airGapRadiusMm: optionalNumber(revision.airGapRadiusMm),
    airGapFluxDensityT: optionalNumber(revision.airGapFluxDensityT),
    poleCoverage: optionalNumber(revision.poleCoverage),
    notes: revision.notes,
    releasedAt: revision.releasedAt?.toISOString() ?? null,
  };
}
