/**
 * The wire or magnet attributes the item page shows, with what its stock comes to: a
 * wire's metres and mass figures, a magnet's mass per piece and in total. Figures the
 * engineering estimates refuse (a size or grade they no longer know) are left out, the
 * attributes shown without them. Null for other parts.
 */
import {
  CONDUCTOR_MATERIALS,
  ENAMELS,
  findIecNominalDiameter,
  findInsulationKind,
  type ConductorKey,
} from "~/engineering/reference-data";
import { findItemAttributes } from "./item-details.server";
import {
  magnetShapeOf,
  magnetStockFigures,
  wireStockFigures,
} from "./stocked-item-figures";

export async function itemPageAttributes(item: {
  id: number;
  kind: "wire" | "magnet" | "part";
  onHand: number;
}) {
  const found = await findItemAttributes(item.id, item.kind);
  if (found?.kind === "wire") {
    let figures = null;
    try {
      figures = wireStockFigures({
        conductor: found.conductor as ConductorKey,
        standard: found.standard,
        sizeLabel: found.sizeLabel,
        onHandKg: item.onHand,
      });
    } catch {
      // A size or conductor the engineering tables no longer know: show the attributes without figures.
    }
    return { ...found, figures, names: wireNames(found) };
  }
  if (found?.kind === "magnet") {
    const shape = magnetShapeOf(found.shape, found.dimensionsMm);
    let figures = null;
    if (found.grade && shape) {
      try {
        figures = magnetStockFigures({
          grade: found.grade,
          shape,
          pieces: item.onHand,
        });
      } catch {
        // Stored dimensions the estimate refuses: show them without a mass.
      }
    }
    const grade = found.grade
      ? {
          name: found.grade.name,
          material: found.grade.material,
          maxWorkingTemperatureC: found.grade.maxWorkingTemperatureC,
          densityGPerCm3: found.grade.densityGPerCm3,
        }
      : null;
    return {
      kind: "magnet" as const,
      gradeKey: found.gradeKey,
      grade,
      shape,
      coating: found.coating,
      magnetisation: found.magnetisation,
      figures: figures && {
        massPerPieceKg: figures.massPerPieceKg,
        totalMassKg: figures.totalMassKg,
      },
    };
  }
  return null;
}

/**
 * The names of a wire's stored keys, looked up here so the page does not load the
 * reference data (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
function wireNames(wire: {
  conductor: string;
  standard: "AWG" | "IEC";
  sizeLabel: string;
  insulation: string | null;
  enamel: string;
}) {
  return {
    conductor:
      CONDUCTOR_MATERIALS.find((material) => material.key === wire.conductor)
        ?.name ?? wire.conductor,
    insulation: wire.insulation
      ? (findInsulationKind(wire.insulation)?.name ?? wire.insulation)
      : null,
    enamel: ENAMELS.find((row) => row.key === wire.enamel)?.name ?? wire.enamel,
    /** An IEC size between the R20/R40 steps (always false for AWG). */
    betweenIecSteps:
      wire.standard === "IEC" &&
      !findIecNominalDiameter(Number(wire.sizeLabel)),
  };
}
