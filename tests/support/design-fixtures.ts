/**
 * Designs written straight into the test database (a design, one revision and its
 * lines), so build-order tests do not depend on the design pages or API.
 */
import type mysql from "mysql2/promise";
import { testDatabase, uniqueCode } from "./test-database";

export type FixtureLine =
  | {
      kind: "coil";
      itemId: number;
      turns: number;
      activeLengthMm: number;
      endTurnLengthMm: number;
      leadLengthMm?: number;
      strandsInHand?: number;
      coilsPerMotor?: number;
      scrapPercent?: number;
      operatingTemperatureC?: number;
    }
  | { kind: "magnet"; itemId: number; piecesPerMotor: number }
  | { kind: "part"; itemId: number; quantityPerMotor: string };

/** The demo builder (seeded) owns the fixtures. */
const owner = "demo-03-builder";

/** A design with revision 1 holding the lines; released unless asked otherwise. */
export async function createDesign(
  lines: FixtureLine[],
  options: {
    status?: "draft" | "released";
    name?: string;
    /** Another database than the test database (a Galera node's). */
    database?: mysql.Pool;
  } = {},
): Promise<{ designId: number; revision: number; revisionId: number }> {
  const db = options.database ?? testDatabase();
  const status = options.status ?? "released";
  const [design] = await db.query(
    "INSERT INTO designs (name, motor_type, user_id, created_at) VALUES (?, 'outrunner BLDC', ?, NOW(3))",
    [options.name ?? uniqueCode("Test motor"), owner],
  );
  const designId = (design as { insertId: number }).insertId;
  const [revision] = await db.query(
    `INSERT INTO design_revisions
       (design_id, revision, status, poles, slots, rated_current_a, insulation_class_c, released_at, released_by, created_at)
     VALUES (?, 1, ?, 14, 12, 10, 155, ?, ?, NOW(3))`,
    [
      designId,
      status,
      status === "released" ? new Date() : null,
      status === "released" ? owner : null,
    ],
  );
  const revisionId = (revision as { insertId: number }).insertId;
  for (const [index, line] of lines.entries()) {
    const common = [revisionId, index + 1, line.kind, line.itemId];
    if (line.kind === "coil") {
      await db.query(
        `INSERT INTO design_lines
           (revision_id, position, kind, item_id, turns, strands_in_hand, active_length_mm, end_turn_length_mm,
            lead_length_mm, coils_per_motor, scrap_percent, operating_temperature_c)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
        [
          ...common,
          line.turns,
          line.strandsInHand ?? 1,
          line.activeLengthMm,
          line.endTurnLengthMm,
          line.leadLengthMm ?? 0,
          line.coilsPerMotor ?? 1,
          line.scrapPercent ?? 0,
          line.operatingTemperatureC ?? 20,
        ],
      );
    } else if (line.kind === "magnet") {
      await db.query(
        "INSERT INTO design_lines (revision_id, position, kind, item_id, pieces_per_motor) VALUES (?, ?, ?, ?, ?)",
        [...common, line.piecesPerMotor],
      );
    } else {
      await db.query(
        "INSERT INTO design_lines (revision_id, position, kind, item_id, quantity_per_motor) VALUES (?, ?, ?, ?, ?)",
        [...common, line.quantityPerMotor],
      );
    }
  }
  return { designId, revision: 1, revisionId };
}
