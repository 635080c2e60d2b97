/**
 * Rows of the reference page (/reference): each table as stored, with the
 * source of every row. Only the columns the page shows are read.
 */
import { asc, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  conductorMaterials,
  insulationKinds,
  magnetGrades,
  publishedOverallDiameters,
  thermalClasses,
  users,
} from "~/db/schema";
import { ENAMELS, INSULATION_KINDS } from "~/engineering/reference-data";
import { mmToInches } from "~/engineering/units";
import { circleAreaMm2 } from "~/engineering/wire-geometry";
import { magnetGradeFromRow } from "./magnet-grades.server";
import { listWireSizes } from "./wire-sizes.server";

/** Thin to thick, as the data module lists them (grade 1, 2, 3; single, heavy, triple). */
function insulationRank(key: string): number {
  const rank = INSULATION_KINDS.findIndex((kind) => kind.key === key);
  return rank === -1 ? INSULATION_KINDS.length : rank;
}

export async function listInsulationKinds() {
  const rows = await db
    .select({
      key: insulationKinds.key,
      standard: insulationKinds.standard,
      name: insulationKinds.name,
      source: insulationKinds.source,
    })
    .from(insulationKinds);
  return rows.sort((a, b) => insulationRank(a.key) - insulationRank(b.key));
}

/**
 * AWG and IEC sizes with bare diameter (mm and in), area and the published
 * maximum overall diameters, each of those with its insulation and source.
 */
export async function listWireSizeRows() {
  const [awg, iec, published, insulation] = await Promise.all([
    listWireSizes("AWG"),
    listWireSizes("IEC"),
    db
      .select({
        standard: publishedOverallDiameters.standard,
        sizeLabel: publishedOverallDiameters.sizeLabel,
        insulationKey: publishedOverallDiameters.insulationKey,
        maxOverallDiameterMm: publishedOverallDiameters.maxOverallDiameterMm,
        source: publishedOverallDiameters.source,
      })
      .from(publishedOverallDiameters),
    listInsulationKinds(),
  ]);
  const insulationName = new Map(
    insulation.map((kind) => [kind.key, kind.name]),
  );
  return [...awg, ...iec].map((size) => ({
    standard: size.standard,
    size: size.size,
    series: size.series,
    bareDiameterMm: size.bareDiameterMm,
    bareDiameterIn: mmToInches(size.bareDiameterMm),
    areaMm2: circleAreaMm2(size.bareDiameterMm),
    source: size.source,
    overallDiameters: published
      .filter(
        (row) => row.standard === size.standard && row.sizeLabel === size.size,
      )
      .sort(
        (a, b) =>
          insulationRank(a.insulationKey) - insulationRank(b.insulationKey),
      )
      .map((row) => ({
        insulation: insulationName.get(row.insulationKey) ?? row.insulationKey,
        maxOverallDiameterMm: Number(row.maxOverallDiameterMm),
        source: row.source,
      })),
  }));
}

/** Thermal classes with the names of their typical enamels (and whether each is solderable). */
export async function listThermalClasses() {
  const rows = await db
    .select({
      classC: thermalClasses.classC,
      letter: thermalClasses.letter,
      typicalEnamels: thermalClasses.typicalEnamels,
      source: thermalClasses.source,
    })
    .from(thermalClasses)
    .orderBy(asc(thermalClasses.classC));
  return rows.map((row) => ({
    classC: row.classC,
    letter: row.letter,
    source: row.source,
    enamels: row.typicalEnamels
      .split(",")
      .map((key) => key.trim())
      .filter(Boolean)
      .map((key) => {
        const enamel = ENAMELS.find((candidate) => candidate.key === key);
        return {
          name: enamel?.name ?? key,
          solderable: enamel?.solderable ?? null,
          classRange: enamel
            ? [enamel.thermalClassMin, enamel.thermalClassMax]
            : null,
        };
      }),
  }));
}

export async function listConductorMaterials() {
  const rows = await db
    .select({
      key: conductorMaterials.key,
      name: conductorMaterials.name,
      resistivity20: conductorMaterials.resistivity20,
      temperatureCoefficient20: conductorMaterials.temperatureCoefficient20,
      density: conductorMaterials.density,
      source: conductorMaterials.source,
    })
    .from(conductorMaterials)
    .orderBy(asc(conductorMaterials.name));
  return rows.map((row) => ({
    key: row.key,
    name: row.name,
    resistivity20OhmMm2PerM: Number(row.resistivity20),
    temperatureCoefficient20PerK: Number(row.temperatureCoefficient20),
    densityGPerCm3: Number(row.density),
    source: row.source,
  }));
}

/** Every magnet grade with all its properties, whether it is built in, and who added it if not. */
export async function listMagnetGradeRows() {
  const rows = await db
    .select({ grade: magnetGrades, addedByName: users.name })
    .from(magnetGrades)
    .leftJoin(users, eq(users.id, magnetGrades.addedBy));
  return rows.map(({ grade, addedByName }) => ({
    ...magnetGradeFromRow(grade),
    builtIn: grade.builtIn,
    addedByName: grade.builtIn
      ? null
      : (addedByName ?? "an admin no longer here"),
  }));
}
