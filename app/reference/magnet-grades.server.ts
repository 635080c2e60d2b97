import { asc, eq, or, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { magnetGrades } from "~/db/schema";
import type { MagnetGrade, NdfebSuffix } from "~/engineering/reference-data";

type Row = typeof magnetGrades.$inferSelect;

/** A database row as the engineering modules' MagnetGrade (DECIMAL strings → numbers). */
export function magnetGradeFromRow(row: Row): MagnetGrade {
  return {
    key: row.key,
    name: row.name,
    aliases: row.aliases ? row.aliases.split(",") : [],
    material: row.material,
    temperatureSuffix: row.temperatureSuffix as NdfebSuffix | null,
    brMinT: Number(row.brMinT),
    brMaxT: Number(row.brMaxT),
    hcbMinKAm: Number(row.hcbMinKAm),
    hcjMinKAm: Number(row.hcjMinKAm),
    bhMaxMinKJm3: Number(row.bhMaxMinKJm3),
    bhMaxMaxKJm3: Number(row.bhMaxMaxKJm3),
    maxWorkingTemperatureC: row.maxWorkingTemperatureC,
    brTemperatureCoefficientPerK: Number(row.brTemperatureCoefficientPerK),
    densityGPerCm3: Number(row.densityGPerCm3),
    recoilPermeability: Number(row.recoilPermeability),
    coercivityFallsWhenCold: row.coercivityFallsWhenCold,
    hcjTemperatureCoefficientPerK:
      row.hcjTemperatureCoefficientPerK === null
        ? null
        : Number(row.hcjTemperatureCoefficientPerK),
    curieTemperatureC: row.curieTemperatureC,
    source: row.source,
  };
}

/** Every grade, by material then name (a few dozen rows: the reference table shows them all). */
export async function listMagnetGrades() {
  const rows = await db
    .select()
    .from(magnetGrades)
    .orderBy(asc(magnetGrades.material), asc(magnetGrades.name));
  return rows.map((row) => ({
    ...magnetGradeFromRow(row),
    builtIn: row.builtIn,
  }));
}

/** The grade whose name, key or alias matches (case-insensitive), or null. */
export async function findMagnetGradeByName(
  name: string,
): Promise<MagnetGrade | null> {
  const wanted = name.trim().toLowerCase();
  const [row] = await db
    .select()
    .from(magnetGrades)
    .where(
      or(
        eq(magnetGrades.key, wanted),
        sql`LOWER(${magnetGrades.name}) = ${wanted}`,
        sql`FIND_IN_SET(${wanted}, LOWER(${magnetGrades.aliases})) > 0`,
      ),
    )
    .limit(1);
  return row ? magnetGradeFromRow(row) : null;
}
