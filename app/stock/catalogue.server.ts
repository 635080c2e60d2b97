/** Creating and changing catalogue items (the movement ledger is in stock-movements.server.ts). */
import { eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  retryWriteConflicts,
  writeTransaction,
} from "~/db/write-transaction.server";
import { isDuplicateKey } from "~/db/database-errors";
import { items, magnetItems, wireItems } from "~/db/schema";
import {
  findAwgSize,
  findIecDiameter,
  iecDiameterProblem,
} from "~/engineering/reference-data";
import { magnetVolumeMm3 } from "~/engineering/magnet-estimate";
import { findMagnetGradeByName } from "~/reference/magnet-grades.server";
import { iecSizeLabel } from "~/reference/wire-size-labels";
import type { ItemCreateInput, ItemPatchInput } from "./item-schemas";
import { formatQuantityText, quantityFromNumber } from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";

const insulationNames: Record<string, string> = {
  grade1: "grade 1",
  grade2: "grade 2",
  grade3: "grade 3",
  single: "single build",
  heavy: "heavy build",
  triple: "triple build",
};

function quantityText(value: number): string {
  return formatQuantityText(quantityFromNumber(value) ?? 0n);
}

function shapeLabel(shape: ItemCreateInput & { kind: "magnet" }): string {
  const s = shape.shape;
  const mm = (value: number) =>
    // Part of the item's stored name: plain digits, whoever adds it.
    String(Math.round(value * 100) / 100);
  switch (s.kind) {
    case "block":
      return `block ${mm(s.lengthMm)}×${mm(s.widthMm)}×${mm(s.heightMm)}`;
    case "arc":
      return `arc R${mm(s.outerRadiusMm)}/R${mm(s.innerRadiusMm)} ${mm(s.angleDeg)}° × ${mm(s.axialLengthMm)}`;
    case "disc":
      return `disc Ø${mm(s.diameterMm)}×${mm(s.thicknessMm)}`;
    case "ring":
      return `ring Ø${mm(s.outerDiameterMm)}/Ø${mm(s.innerDiameterMm)}×${mm(s.thicknessMm)}`;
  }
}

/** Creates an item; returns its SKU. 400 for unknown sizes or grades, 409 for a SKU in use. */
export async function createItem(
  input: ItemCreateInput,
  _userId: string,
): Promise<string> {
  let unit: "kg" | "pcs" | "m";
  let sizeOrGrade: string;
  let wire: {
    conductor: string;
    standard: "AWG" | "IEC";
    sizeLabel: string;
    insulation: string;
    thermalClass: number;
    enamel: string;
  } | null = null;
  let magnet: {
    gradeKey: string;
    shape: "block" | "arc" | "disc" | "ring";
    dimensionsMm: string;
    coating: string;
    magnetisation: string;
  } | null = null;

  if (input.kind === "wire") {
    let sizeLabel: string;
    if (input.standard === "AWG") {
      const size = findAwgSize(input.size);
      if (!size)
        throw new DomainError(
          400,
          `AWG ${input.size} is not a size from 4/0 to 46.`,
          "size",
        );
      sizeLabel = size.label;
    } else {
      // Any nominal diameter of IEC 60317-0-1's range, the R20/R40 steps and the sizes
      // between them (0.350 mm), to 0.001 mm.
      const diameterMm =
        input.size.trim() === "" ? Number.NaN : Number(input.size);
      const diameter = findIecDiameter(diameterMm);
      if (!diameter)
        throw new DomainError(
          400,
          iecDiameterProblem(diameterMm) ??
            `${input.size} mm is not an IEC 60317 nominal diameter.`,
          "size",
        );
      sizeLabel = iecSizeLabel(diameter.diameterMm);
    }
    const iecInsulation = input.insulation.startsWith("grade");
    if (iecInsulation !== (input.standard === "IEC")) {
      throw new DomainError(
        400,
        input.standard === "IEC"
          ? "IEC wire takes grade1, grade2 or grade3."
          : "AWG wire takes single, heavy or triple.",
        "insulation",
      );
    }
    unit = "kg";
    sizeOrGrade = `${input.standard === "AWG" ? "AWG " : ""}${sizeLabel}${input.standard === "IEC" ? " mm" : ""} ${insulationNames[input.insulation]}, class ${input.thermalClass}`;
    wire = {
      conductor: input.conductor,
      standard: input.standard,
      sizeLabel,
      insulation: input.insulation,
      thermalClass: input.thermalClass,
      enamel: input.enamel,
    };
  } else if (input.kind === "magnet") {
    const grade = await findMagnetGradeByName(input.grade);
    if (!grade)
      throw new DomainError(
        400,
        `Unknown magnet grade "${input.grade}".`,
        "grade",
      );
    magnetVolumeMm3(input.shape); // refuses impossible shapes (a ring whose hole is wider than the ring …)
    unit = "pcs";
    sizeOrGrade = `${grade.name} ${shapeLabel(input)}`;
    const { kind: shape, ...dimensions } = input.shape;
    magnet = {
      gradeKey: grade.key,
      shape,
      dimensionsMm: JSON.stringify(dimensions),
      coating: input.coating,
      magnetisation: input.magnetisation,
    };
  } else {
    unit = input.unit;
    sizeOrGrade = "";
  }

  if (unit === "pcs") {
    for (const field of ["reorderPoint", "reorderQuantity"] as const) {
      if (!Number.isInteger(input[field]))
        throw new DomainError(
          400,
          `${input.sku} is counted in whole pieces.`,
          field,
        );
    }
  }

  try {
    await writeTransaction(async (tx) => {
      const [created] = await tx
        .insert(items)
        .values({
          sku: input.sku,
          name: input.name,
          kind: input.kind,
          unit,
          sizeOrGrade: sizeOrGrade.slice(0, 80),
          reorderPoint: quantityText(input.reorderPoint),
          reorderQuantity: quantityText(input.reorderQuantity),
        })
        .$returningId();
      const itemId = created!.id;
      if (wire) await tx.insert(wireItems).values({ itemId, ...wire });
      if (magnet) await tx.insert(magnetItems).values({ itemId, ...magnet });
    });
  } catch (error) {
    if (isDuplicateKey(error))
      throw new DomainError(
        409,
        `SKU ${input.sku} is already in the catalogue.`,
        "sku",
      );
    throw error;
  }
  return input.sku;
}

/** Changes an item's name, reorder fields or active state. */
export async function updateItem(
  sku: string,
  change: ItemPatchInput,
): Promise<void> {
  const [item] = await db
    .select({ id: items.id, unit: items.unit })
    .from(items)
    .where(eq(items.sku, sku))
    .limit(1);
  if (!item) throw new DomainError(404, `No item with SKU "${sku}".`, "sku");
  for (const field of ["reorderPoint", "reorderQuantity"] as const) {
    const value = change[field];
    if (
      value !== undefined &&
      item.unit === "pcs" &&
      !Number.isInteger(value)
    ) {
      throw new DomainError(400, `${sku} is counted in whole pieces.`, field);
    }
  }
  // Every movement writes this row too: retried on a conflict like a transaction.
  await retryWriteConflicts(
    () =>
      db
        .update(items)
        .set({
          ...(change.name !== undefined ? { name: change.name } : {}),
          ...(change.reorderPoint !== undefined
            ? { reorderPoint: quantityText(change.reorderPoint) }
            : {}),
          ...(change.reorderQuantity !== undefined
            ? { reorderQuantity: quantityText(change.reorderQuantity) }
            : {}),
          ...(change.active !== undefined ? { active: change.active } : {}),
          updatedAt: new Date(),
        })
        .where(eq(items.id, item.id)),
    { label: "item update" },
  );
}
