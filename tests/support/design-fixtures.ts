/**
 * Designs written straight into the test database (a design, one revision and its
 * lines), so build-order tests do not depend on the design pages or API.
 */
import type mysql from "mysql2/promise";
import { designLines, designRevisions, designs } from "~/db/schema";
import { testDb, uniqueCode } from "./test-database";

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
  const db = testDb(options.database);
  const status = options.status ?? "released";
  const [design] = await db
    .insert(designs)
    .values({
      name: options.name ?? uniqueCode("Test motor"),
      motorType: "outrunner BLDC",
      userId: owner,
    })
    .$returningId();
  const designId = design!.id;
  const [revision] = await db
    .insert(designRevisions)
    .values({
      designId,
      revision: 1,
      status,
      poles: 14,
      slots: 12,
      ratedCurrentA: "10",
      insulationClassC: 155,
      releasedAt: status === "released" ? new Date() : null,
      releasedBy: status === "released" ? owner : null,
    })
    .$returningId();
  const revisionId = revision!.id;
  for (const [index, line] of lines.entries()) {
    const common = {
      revisionId,
      position: index + 1,
      kind: line.kind,
      itemId: line.itemId,
    };
    if (line.kind === "coil") {
      await db.insert(designLines).values({
        ...common,
        turns: line.turns,
        strandsInHand: line.strandsInHand ?? 1,
        activeLengthMm: String(line.activeLengthMm),
        endTurnLengthMm: String(line.endTurnLengthMm),
        leadLengthMm: String(line.leadLengthMm ?? 0),
        coilsPerMotor: line.coilsPerMotor ?? 1,
        scrapPercent: String(line.scrapPercent ?? 0),
        operatingTemperatureC: String(line.operatingTemperatureC ?? 20),
      });
    } else if (line.kind === "magnet") {
      await db
        .insert(designLines)
        .values({ ...common, piecesPerMotor: line.piecesPerMotor });
    } else {
      await db
        .insert(designLines)
        .values({ ...common, quantityPerMotor: line.quantityPerMotor });
    }
  }
  return { designId, revision: 1, revisionId };
}
