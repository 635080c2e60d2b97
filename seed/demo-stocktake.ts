/**
 * A stocktake in progress for the demo: parts shelving C, started by the storekeeper,
 * two lines counted (one a piece short), the rest still to count. Written through the
 * app's own stocktake code, so it starts and counts exactly as the pages do.
 */
import { parseQuantity, quantityScale } from "~/lib/decimal-amounts";
import { recordCount } from "~/stocktakes/stocktake-counts.server";
import {
  listReviewLines,
  startStocktake,
} from "~/stocktakes/stocktakes.server";
import { demoPersonId } from "./demo-person-ids";

export async function seedDemoStocktake(): Promise<void> {
  const storekeeper = demoPersonId("storekeeper");
  const { id } = await startStocktake(
    {
      intent: "start",
      locations: ["PARTS-C1"],
      skus: [],
      note: "Quarterly count of parts shelving C",
    },
    storekeeper,
  );
  const lines = await listReviewLines(id);
  for (const [index, line] of lines.slice(0, 2).entries()) {
    const book = parseQuantity(line.bookAtStart);
    // The first line is found one short; the second as the book says.
    const found =
      index === 0 && book >= quantityScale ? book - quantityScale : book;
    await recordCount(
      id,
      { intent: "count", lineId: line.id, quantity: found },
      storekeeper,
    );
  }
}
