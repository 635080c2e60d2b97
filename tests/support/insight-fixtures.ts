/**
 * The cost insight's test design and how to read it: a released design with a
 * rated torque whose every line has a supplier price, so the manager's start
 * page and /insight show its cost per N·m; its row in the designs table; the
 * what-if form's hydration.
 */
import { eq, sum } from "drizzle-orm";
import type { Page } from "playwright-core";
import { designLines, designRevisions, metalBasePrices } from "~/db/schema";
import { signInAs } from "./app-client";
import {
  createMagnetItem,
  createPartItem,
  createWireItem,
} from "./build-order-fixtures";
import { createDesign } from "./design-fixtures";
import { readable } from "./page-text";
import {
  createSupplier,
  importPriceList,
  mapSupplierSku,
} from "./price-list-fixtures";
import { testDb, uniqueCode } from "./test-database";

/**
 * Three items priced as in designs-api.test.ts, valid since 2020 so they hold today:
 * wire at a 3.50/kg adder on the copper base, magnets 2.00, bearings 1.50; and a
 * released design of 40 turns of that wire, two magnets and one bearing, rated
 * 0.5 N·m (measured).
 */
export async function createPricedReleasedDesign() {
  const buyer = await signInAs("buyer");
  const wire = await createWireItem(buyer);
  const magnet = await createMagnetItem(buyer);
  const part = await createPartItem(buyer);
  const supplier = `Insight browser supplier ${uniqueCode("S")}`;
  const supplierId = await createSupplier(buyer, supplier);
  for (const item of [wire, magnet, part])
    await mapSupplierSku(supplierId, `B-${item.sku}`, item.id);
  await importPriceList(buyer, {
    supplier,
    fileName: "insight-browser.csv",
    lines: [
      "Art. no,Kind,Standard,Size,Grade,Price,Adder per kg,Currency,Valid from",
      `B-${wire.sku},wire,IEC,0.8,,,3.50,EUR,2020-01-01`,
      `B-${magnet.sku},magnet,,,N42SH,2.00,,EUR,2020-01-01`,
      `B-${part.sku},part,,,,1.50,,EUR,2020-01-01`,
    ],
    mapping: {
      supplierSku: "Art. no",
      kind: "Kind",
      standard: "Standard",
      size: "Size",
      grade: "Grade",
      price: "Price",
      adderPerKg: "Adder per kg",
      currency: "Currency",
      validFrom: "Valid from",
    },
  });

  const designName = uniqueCode("Spindle motor 12N14P");
  const design = await createDesign(
    [
      {
        kind: "coil",
        itemId: wire.id,
        turns: 40,
        activeLengthMm: 50,
        endTurnLengthMm: 30,
        leadLengthMm: 150,
      },
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 2 },
      { kind: "part", itemId: part.id, quantityPerMotor: "1" },
    ],
    { name: designName },
  );
  await testDb()
    .update(designRevisions)
    .set({ ratedTorqueNm: "0.5", torqueBasis: "measured" })
    .where(eq(designRevisions.id, design.revisionId));
  return { designName, designId: design.designId, wire, magnet, part };
}

/** The design's row in the table of cost per motor and per N·m, no-break spaces made plain. */
export async function designRowText(
  page: Page,
  designName: string,
): Promise<string> {
  return readable(
    await page
      .getByRole("table", { name: /Released designs: cost per motor/ })
      .getByRole("row", { name: new RegExp(designName) })
      .textContent(),
  );
}

/** Console errors and page errors (a failed hydration shows here). */
export function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on("console", (message) => {
    if (message.type() === "error") errors.push(message.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

/** Waits until React has hydrated the what-if form and every field of it (each carries React's fiber). */
export async function waitForWhatIfHydration(
  page: Page,
  errors: string[],
): Promise<void> {
  const hydrated = page.waitForFunction(() => {
    const fields = [
      document.getElementById("insight-what-if"),
      ...document.querySelectorAll('[form="insight-what-if"]'),
    ];
    return fields.every(
      (field) =>
        field !== null &&
        Object.keys(field).some((key) => key.startsWith("__reactFiber")),
    );
  });
  await hydrated.catch((error: Error) => {
    throw new Error(
      `${error.message}; the console said: ${errors.join(" | ")}`,
    );
  });
}

/** Counts that any write by the what-if would change. */
export async function designCounts() {
  const db = testDb();
  return {
    bases: await db.$count(metalBasePrices),
    endTurns: (
      await db
        .select({ total: sum(designLines.endTurnLengthMm) })
        .from(designLines)
    )[0]!.total,
    revisions: await db.$count(designRevisions),
  };
}
