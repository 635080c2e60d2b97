/**
 * Writes the built-in engineering reference data (app/engineering/reference-data.ts)
 * into its tables. Runs after the migrations at every start and test run, so a
 * corrected value in the data module reaches every database. Rows admins added
 * are left alone.
 */
import { sql } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import {
  AWG_SIZES,
  CONDUCTOR_MATERIALS,
  IEC_NOMINAL_DIAMETERS,
  INSULATION_KINDS,
  MAGNET_GRADES,
  PUBLISHED_MAX_OVERALL_DIAMETERS,
  THERMAL_CLASSES,
} from "~/engineering/reference-data";
import type * as schema from "~/db/schema";
import {
  conductorMaterials,
  insulationKinds,
  magnetGrades,
  publishedOverallDiameters,
  thermalClasses,
  wireSizes,
} from "~/db/schema";
import { runWithRetries } from "~/db/write-conflicts";
import { iecSizeLabel } from "./wire-size-labels";

type Database = MySql2Database<typeof schema>;

/** Every column of the row is replaced by the incoming value on a key clash. */
function replaceAll(columns: string[]) {
  return Object.fromEntries(
    columns.map((column) => [column, sql.raw(`VALUES(\`${column}\`)`)]),
  );
}

/** As replaceAll, but a row an admin added (built_in = 0) keeps its values. */
function replaceBuiltIn(columns: string[]) {
  return Object.fromEntries(
    columns.map((column) => [
      column,
      sql.raw(`IF(\`built_in\` = 1, VALUES(\`${column}\`), \`${column}\`)`),
    ]),
  );
}

const text = (value: number) => String(value);

export async function syncReferenceData(db: Database): Promise<void> {
  // The migration script's own client, not the app's (whose module needs DATABASE_URL at
  // import): the same retries as writeTransaction, from the same rules. Runs inside
  // db:migrate, under its lock; retried all the same, since on a Galera cluster app
  // servers writing on other nodes may still conflict with it at certification.
  await runWithRetries(() =>
    // eslint-disable-next-line no-restricted-syntax -- see above
    db.transaction(async (tx) => {
      await tx
        .insert(conductorMaterials)
        .values(
          CONDUCTOR_MATERIALS.map((row) => ({
            key: row.key,
            name: row.name,
            resistivity20: row.resistivity20OhmMm2PerM.toFixed(9),
            temperatureCoefficient20: text(row.temperatureCoefficient20PerK),
            density: text(row.densityGPerCm3),
            source: row.source,
          })),
        )
        .onDuplicateKeyUpdate({
          set: replaceAll([
            "name",
            "resistivity_20_ohm_mm2_per_m",
            "temperature_coefficient_20_per_k",
            "density_g_per_cm3",
            "source",
          ]),
        });

      const sizes = [
        ...AWG_SIZES.map((row) => ({
          standard: "AWG" as const,
          label: row.label,
          gaugeNumber: row.gaugeNumber,
          series: null,
          bareDiameterMm: row.bareDiameterMm.toFixed(6),
          source: row.source,
        })),
        ...IEC_NOMINAL_DIAMETERS.map((row) => ({
          standard: "IEC" as const,
          label: iecSizeLabel(row.diameterMm),
          gaugeNumber: null,
          series: row.series,
          bareDiameterMm: row.diameterMm.toFixed(6),
          source: row.source,
        })),
      ];
      await tx
        .insert(wireSizes)
        .values(sizes)
        .onDuplicateKeyUpdate({
          set: replaceAll([
            "gauge_number",
            "series",
            "bare_diameter_mm",
            "source",
          ]),
        });

      await tx
        .insert(insulationKinds)
        .values(
          INSULATION_KINDS.map((row) => ({
            key: row.key,
            standard: row.standard,
            name: row.name,
            source: row.source,
          })),
        )
        .onDuplicateKeyUpdate({
          set: replaceAll(["standard", "name", "source"]),
        });

      await tx
        .insert(publishedOverallDiameters)
        .values(
          PUBLISHED_MAX_OVERALL_DIAMETERS.map((row) => ({
            standard: row.standard,
            sizeLabel:
              row.standard === "IEC"
                ? iecSizeLabel(Number(row.size))
                : row.size,
            insulationKey: row.insulation,
            maxOverallDiameterMm: row.maxOverallDiameterMm.toFixed(4),
            source: row.source,
          })),
        )
        .onDuplicateKeyUpdate({
          set: replaceAll(["max_overall_diameter_mm", "source"]),
        });

      await tx
        .insert(thermalClasses)
        .values(
          THERMAL_CLASSES.map((row) => ({
            classC: row.classC,
            letter: row.letter,
            typicalEnamels: row.typicalEnamels.join(", "),
            source: row.source,
          })),
        )
        .onDuplicateKeyUpdate({
          set: replaceAll(["letter", "typical_enamels", "source"]),
        });

      await tx
        .insert(magnetGrades)
        .values(
          MAGNET_GRADES.map((row) => ({
            key: row.key,
            name: row.name,
            aliases: row.aliases.join(","),
            material: row.material,
            temperatureSuffix: row.temperatureSuffix,
            brMinT: text(row.brMinT),
            brMaxT: text(row.brMaxT),
            hcbMinKAm: text(row.hcbMinKAm),
            hcjMinKAm: text(row.hcjMinKAm),
            bhMaxMinKJm3: text(row.bhMaxMinKJm3),
            bhMaxMaxKJm3: text(row.bhMaxMaxKJm3),
            maxWorkingTemperatureC: row.maxWorkingTemperatureC,
            brTemperatureCoefficientPerK: text(
              row.brTemperatureCoefficientPerK,
            ),
            densityGPerCm3: text(row.densityGPerCm3),
            recoilPermeability: text(row.recoilPermeability),
            coercivityFallsWhenCold: row.coercivityFallsWhenCold,
            hcjTemperatureCoefficientPerK:
              row.hcjTemperatureCoefficientPerK === null
                ? null
                : row.hcjTemperatureCoefficientPerK.toFixed(6),
            curieTemperatureC: row.curieTemperatureC,
            source: row.source,
            builtIn: true,
          })),
        )
        .onDuplicateKeyUpdate({
          // built_in last: MariaDB evaluates the assignments in order, so the IF()s still see the old flag.
          set: replaceBuiltIn([
            "name",
            "aliases",
            "material",
            "temperature_suffix",
            "br_min_t",
            "br_max_t",
            "hcb_min_ka_per_m",
            "hcj_min_ka_per_m",
            "bh_max_min_kj_per_m3",
            "bh_max_max_kj_per_m3",
            "max_working_temperature_c",
            "br_temperature_coefficient_per_k",
            "density_g_per_cm3",
            "recoil_permeability",
            "coercivity_falls_when_cold",
            "hcj_temperature_coefficient_per_k",
            "curie_temperature_c",
            "source",
            "built_in",
          ]),
        });
    }),
  );
}
