/**
 * Engineering reference data: seeded from app/engineering/reference-data.ts at
 * every start (built-in rows), shown on the reference pages and read by the
 * estimate API. Admins may add magnet grades (makers' grades vary); wire
 * sizes, insulation and conductors are fixed by their standards.
 */
import {
  boolean,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  smallint,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { createdAt, users } from "./accounts";

const source = () => varchar("source", { length: 500 }).notNull();

export const conductorMaterials = mysqlTable("conductor_materials", {
  key: varchar("material_key", { length: 20 }).primaryKey(),
  name: varchar("name", { length: 80 }).notNull(),
  /** Ω·mm²/m at 20 °C. */
  resistivity20: decimal("resistivity_20_ohm_mm2_per_m", {
    precision: 12,
    scale: 9,
  }).notNull(),
  /** 1/K at 20 °C. */
  temperatureCoefficient20: decimal("temperature_coefficient_20_per_k", {
    precision: 10,
    scale: 7,
  }).notNull(),
  /** g/cm³. */
  density: decimal("density_g_per_cm3", { precision: 8, scale: 4 }).notNull(),
  source: source(),
});

export const wireSizes = mysqlTable(
  "wire_sizes",
  {
    id: int("id").autoincrement().primaryKey(),
    standard: mysqlEnum("standard", ["AWG", "IEC"]).notNull(),
    /** "20", "0000" for AWG; "0.800" for IEC. */
    label: varchar("label", { length: 12 }).notNull(),
    /** n in the ASTM B258 formula (AWG only). */
    gaugeNumber: smallint("gauge_number"),
    /** "r20" or "r40" (IEC only). */
    series: varchar("series", { length: 4 }),
    /** Bare diameter, mm (AWG by the formula, unrounded to 1e-6 mm). */
    bareDiameterMm: decimal("bare_diameter_mm", {
      precision: 10,
      scale: 6,
    }).notNull(),
    source: source(),
  },
  (table) => [
    uniqueIndex("wire_sizes_standard_label_unique").on(
      table.standard,
      table.label,
    ),
    index("wire_sizes_diameter_idx").on(table.standard, table.bareDiameterMm),
  ],
);

export const insulationKinds = mysqlTable("insulation_kinds", {
  key: varchar("insulation_key", { length: 12 }).primaryKey(),
  standard: mysqlEnum("standard", ["AWG", "IEC"]).notNull(),
  name: varchar("name", { length: 80 }).notNull(),
  source: source(),
});

/** Published maximum overall diameters (bare + enamel) per size and insulation. */
export const publishedOverallDiameters = mysqlTable(
  "published_overall_diameters",
  {
    id: int("id").autoincrement().primaryKey(),
    standard: mysqlEnum("standard", ["AWG", "IEC"]).notNull(),
    sizeLabel: varchar("size_label", { length: 12 }).notNull(),
    insulationKey: varchar("insulation_key", { length: 12 }).notNull(),
    maxOverallDiameterMm: decimal("max_overall_diameter_mm", {
      precision: 10,
      scale: 4,
    }).notNull(),
    source: source(),
  },
  (table) => [
    uniqueIndex("published_overall_unique").on(
      table.standard,
      table.sizeLabel,
      table.insulationKey,
    ),
  ],
);

export const thermalClasses = mysqlTable("thermal_classes", {
  classC: smallint("class_c").primaryKey(),
  letter: varchar("letter", { length: 2 }).notNull(),
  typicalEnamels: varchar("typical_enamels", { length: 200 }).notNull(),
  source: source(),
});

export const magnetMaterials = [
  "sintered-ndfeb",
  "smco5",
  "sm2co17",
  "hard-ferrite",
  "bonded-ndfeb",
] as const;

export const magnetGrades = mysqlTable(
  "magnet_grades",
  {
    key: varchar("grade_key", { length: 40 }).primaryKey(),
    name: varchar("name", { length: 40 }).notNull(),
    /** Other names people use ("Y30" for ferrite C5), comma-separated. */
    aliases: varchar("aliases", { length: 120 }).notNull().default(""),
    material: mysqlEnum("material", magnetMaterials).notNull(),
    temperatureSuffix: varchar("temperature_suffix", { length: 3 }),
    brMinT: decimal("br_min_t", { precision: 6, scale: 4 }).notNull(),
    brMaxT: decimal("br_max_t", { precision: 6, scale: 4 }).notNull(),
    hcbMinKAm: decimal("hcb_min_ka_per_m", {
      precision: 8,
      scale: 1,
    }).notNull(),
    hcjMinKAm: decimal("hcj_min_ka_per_m", {
      precision: 8,
      scale: 1,
    }).notNull(),
    bhMaxMinKJm3: decimal("bh_max_min_kj_per_m3", {
      precision: 7,
      scale: 1,
    }).notNull(),
    bhMaxMaxKJm3: decimal("bh_max_max_kj_per_m3", {
      precision: 7,
      scale: 1,
    }).notNull(),
    maxWorkingTemperatureC: smallint("max_working_temperature_c").notNull(),
    /** 1/K (−0.0012 = −0.12 %/K). */
    brTemperatureCoefficientPerK: decimal("br_temperature_coefficient_per_k", {
      precision: 9,
      scale: 6,
    }).notNull(),
    /** Reversible temperature coefficient of HcJ, 1/K (about −0.0055 for NdFeB, positive for ferrite); null when unknown. */
    hcjTemperatureCoefficientPerK: decimal(
      "hcj_temperature_coefficient_per_k",
      { precision: 9, scale: 6 },
    ),
    /** Curie temperature of the material, °C; above it the magnet is no magnet. Null when unknown. */
    curieTemperatureC: smallint("curie_temperature_c"),
    densityGPerCm3: decimal("density_g_per_cm3", {
      precision: 6,
      scale: 3,
    }).notNull(),
    recoilPermeability: decimal("recoil_permeability", {
      precision: 5,
      scale: 3,
    }).notNull(),
    coercivityFallsWhenCold: boolean("coercivity_falls_when_cold")
      .notNull()
      .default(false),
    source: source(),
    /** Built-in rows are re-synced from the data module at start; added rows are the admins'. */
    builtIn: boolean("built_in").notNull().default(false),
    addedBy: varchar("added_by", { length: 40 }).references(() => users.id, {
      onDelete: "set null",
    }),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("magnet_grades_name_unique").on(table.name),
    index("magnet_grades_material_idx").on(table.material, table.brMaxT),
  ],
);
