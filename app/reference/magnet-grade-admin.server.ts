/**
 * Magnet grades admins add from makers' data sheets. Built-in grades come from
 * app/engineering/reference-data.ts and are re-synced at every start; added
 * ones are stored with builtIn = false and the admin who added them.
 */
import { sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { isDuplicateKey } from "~/db/database-errors";
import { magnetGrades } from "~/db/schema";
import { magnetGradeKey, type MagnetGradeForm } from "./magnet-grade-form";

export type AddMagnetGradeResult =
  | { added: true; name: string }
  | { added: false; field: "name" | "aliases"; message: string };

/** The existing grade a name would be confused with (its name, key or one of its other names), or null. */
async function gradeKnownAs(name: string): Promise<string | null> {
  const wanted = name.trim().toLowerCase();
  const [row] = await db
    .select({ name: magnetGrades.name })
    .from(magnetGrades)
    .where(
      sql`${magnetGrades.key} IN (${wanted}, ${magnetGradeKey(name)})
        OR LOWER(${magnetGrades.name}) = ${wanted}
        OR FIND_IN_SET(${wanted}, LOWER(${magnetGrades.aliases})) > 0`,
    )
    .limit(1);
  return row?.name ?? null;
}

/** Adds a grade unless its name (or another name of it) is taken. */
export async function addMagnetGrade(
  form: MagnetGradeForm,
  addedBy: string,
): Promise<AddMagnetGradeResult> {
  const taken = await gradeKnownAs(form.name);
  if (taken) {
    return {
      added: false,
      field: "name",
      message:
        taken.toLowerCase() === form.name.toLowerCase()
          ? `There is already a grade called ${taken}.`
          : `This name already stands for the grade ${taken}.`,
    };
  }
  for (const alias of form.aliases) {
    const holder = await gradeKnownAs(alias);
    if (holder) {
      return {
        added: false,
        field: "aliases",
        message: `“${alias}” already stands for the grade ${holder}.`,
      };
    }
  }
  const key = magnetGradeKey(form.name);
  try {
    // One INSERT: the unique key and name indexes settle a race between two admins.
    await db.insert(magnetGrades).values({
      key,
      name: form.name,
      aliases: form.aliases.map((alias) => alias.toLowerCase()).join(","),
      material: form.material,
      temperatureSuffix:
        form.material === "sintered-ndfeb"
          ? (form.temperatureSuffix ?? "")
          : null,
      brMinT: String(form.brMinT),
      brMaxT: String(form.brMaxT),
      hcbMinKAm: String(form.hcbMinKAm),
      hcjMinKAm: String(form.hcjMinKAm),
      bhMaxMinKJm3: String(form.bhMaxMinKJm3),
      bhMaxMaxKJm3: String(form.bhMaxMaxKJm3),
      maxWorkingTemperatureC: form.maxWorkingTemperatureC,
      // The form takes %/K as data sheets print it; the table keeps 1/K.
      brTemperatureCoefficientPerK: (
        form.brTemperatureCoefficientPercentPerK / 100
      ).toFixed(6),
      hcjTemperatureCoefficientPerK:
        form.hcjTemperatureCoefficientPercentPerK === undefined
          ? null
          : (form.hcjTemperatureCoefficientPercentPerK / 100).toFixed(6),
      curieTemperatureC: form.curieTemperatureC ?? null,
      densityGPerCm3: String(form.densityGPerCm3),
      recoilPermeability: String(form.recoilPermeability),
      coercivityFallsWhenCold: form.coercivityFallsWhenCold,
      source: form.source,
      builtIn: false,
      addedBy,
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    return {
      added: false,
      field: "name",
      message: `There is already a grade called ${form.name}.`,
    };
  }
  return { added: true, name: form.name };
}
