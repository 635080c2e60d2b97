/**
 * Motor designs and their revisions (the BOM): coil, magnet and part lines per
 * motor. A draft revision is edited; releasing locks it for good; a new
 * revision starts as a copy of the latest one.
 */
import { sql } from "drizzle-orm";
import {
  check,
  datetime,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  smallint,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { phaseConnections } from "../../engineering/motor-constants";
import { createdAt, users } from "./accounts";
import { items } from "./stock";

export const revisionStatuses = ["draft", "released"] as const;
export const torqueBases = ["measured", "estimated"] as const;
export const designLineKinds = ["coil", "magnet", "part"] as const;
export { phaseConnections };

export const designs = mysqlTable(
  "designs",
  {
    id: int("id").autoincrement().primaryKey(),
    name: varchar("name", { length: 120 }).notNull(),
    description: varchar("description", { length: 1000 }).notNull().default(""),
    /** Free text the builder recognises: "outrunner BLDC", "axial flux" … */
    motorType: varchar("motor_type", { length: 60 }).notNull().default(""),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [uniqueIndex("designs_name_unique").on(table.name)],
);

export const designRevisions = mysqlTable(
  "design_revisions",
  {
    id: int("id").autoincrement().primaryKey(),
    designId: int("design_id")
      .notNull()
      .references(() => designs.id),
    /** 1, 2, 3 … per design. */
    revision: smallint("revision").notNull(),
    status: mysqlEnum("status", revisionStatuses).notNull().default("draft"),
    poles: smallint("poles").notNull(),
    slots: smallint("slots").notNull(),
    /** Rated current: the RMS phase current of a sinusoidal drive, A (each of the parallel paths carries ÷ parallel_paths). */
    ratedCurrentA: decimal("rated_current_a", {
      precision: 10,
      scale: 3,
    }).notNull(),
    ratedTorqueNm: decimal("rated_torque_nm", { precision: 12, scale: 4 }),
    torqueBasis: mysqlEnum("torque_basis", torqueBases)
      .notNull()
      .default("estimated"),
    /** IEC 60085 thermal class of the motor's insulation system, °C. */
    insulationClassC: smallint("insulation_class_c").notNull(),
    /** Slot area, mm², for the fill factor; null when unknown. */
    slotAreaMm2: decimal("slot_area_mm2", { precision: 10, scale: 2 }),
    /** Slot liner and separator (phase paper, wedge) area taken from the slot area, mm²; null = none given. */
    slotLinerAreaMm2: decimal("slot_liner_area_mm2", {
      precision: 10,
      scale: 2,
    }),
    coilSidesPerSlot: smallint("coil_sides_per_slot").notNull().default(2),
    /** Number of phases of the winding (3 for the usual drive). */
    phases: smallint("phases").notNull().default(3),
    /** Winding layers: 1 (single layer) or 2 (double layer). */
    windingLayers: smallint("winding_layers").notNull().default(2),
    phaseConnection: mysqlEnum("phase_connection", phaseConnections)
      .notNull()
      .default("star"),
    /** Parallel paths per phase (a); each coil carries the phase current ÷ a. */
    parallelPaths: smallint("parallel_paths").notNull().default(1),
    /** Rated mechanical speed, rpm, for the electrical frequency (AC resistance, back-EMF); null when unknown. */
    ratedSpeedRpm: decimal("rated_speed_rpm", { precision: 10, scale: 1 }),
    /** For the first-order torque estimate. */
    airGapRadiusMm: decimal("air_gap_radius_mm", { precision: 10, scale: 3 }),
    airGapFluxDensityT: decimal("air_gap_flux_density_t", {
      precision: 6,
      scale: 4,
    }),
    poleCoverage: decimal("pole_coverage", { precision: 4, scale: 3 }),
    notes: varchar("notes", { length: 1000 }).notNull().default(""),
    /**
     * Saves of the draft. Every save changes this row, so a save and a release made at
     * once on two Galera nodes touch the same row and one loses certification (a row
     * only locked with FOR UPDATE is not in a write set): decision 027.
     */
    draftSaves: int("draft_saves").notNull().default(0),
    releasedAt: datetime("released_at", { mode: "date", fsp: 3 }),
    releasedBy: varchar("released_by", { length: 40 }).references(
      () => users.id,
    ),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("design_revisions_unique").on(table.designId, table.revision),
    index("design_revisions_status_idx").on(table.status, table.designId),
    check("design_revisions_poles_positive", sql`${table.poles} > 0`),
    check("design_revisions_slots_positive", sql`${table.slots} > 0`),
    check("design_revisions_phases_positive", sql`${table.phases} > 0`),
    check(
      "design_revisions_layers_valid",
      sql`${table.windingLayers} IN (1, 2)`,
    ),
    check(
      "design_revisions_parallel_paths_positive",
      sql`${table.parallelPaths} > 0`,
    ),
  ],
);

/**
 * One line of a revision. Coil lines use the coil columns, magnet lines
 * `pieces_per_motor`, part lines `quantity_per_motor`; CHECKs keep each kind whole.
 */
export const designLines = mysqlTable(
  "design_lines",
  {
    id: int("id").autoincrement().primaryKey(),
    revisionId: int("revision_id")
      .notNull()
      .references(() => designRevisions.id, { onDelete: "cascade" }),
    position: smallint("position").notNull(),
    kind: mysqlEnum("kind", designLineKinds).notNull(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    turns: int("turns"),
    strandsInHand: smallint("strands_in_hand"),
    activeLengthMm: decimal("active_length_mm", { precision: 10, scale: 2 }),
    endTurnLengthMm: decimal("end_turn_length_mm", {
      precision: 10,
      scale: 2,
    }),
    leadLengthMm: decimal("lead_length_mm", { precision: 10, scale: 2 }),
    coilsPerMotor: smallint("coils_per_motor"),
    scrapPercent: decimal("scrap_percent", { precision: 5, scale: 2 }),
    operatingTemperatureC: decimal("operating_temperature_c", {
      precision: 6,
      scale: 1,
    }),
    piecesPerMotor: int("pieces_per_motor"),
    /** Part lines: per motor, in the item's unit (3 decimals). */
    quantityPerMotor: decimal("quantity_per_motor", {
      precision: 14,
      scale: 3,
    }),
  },
  (table) => [
    uniqueIndex("design_lines_position_unique").on(
      table.revisionId,
      table.position,
    ),
    index("design_lines_item_idx").on(table.itemId),
    check(
      "design_lines_coil_complete",
      sql`${table.kind} <> 'coil' OR (${table.turns} > 0 AND ${table.strandsInHand} > 0 AND ${table.activeLengthMm} > 0 AND ${table.endTurnLengthMm} >= 0 AND ${table.leadLengthMm} >= 0 AND ${table.coilsPerMotor} > 0 AND ${table.scrapPercent} >= 0 AND ${table.operatingTemperatureC} IS NOT NULL)`,
    ),
    check(
      "design_lines_magnet_complete",
      sql`${table.kind} <> 'magnet' OR ${table.piecesPerMotor} > 0`,
    ),
    check(
      "design_lines_part_complete",
      sql`${table.kind} <> 'part' OR ${table.quantityPerMotor} > 0`,
    ),
  ],
);
