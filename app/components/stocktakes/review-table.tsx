/** The reviewer's table: book at the start and at the count, the count, the variance in quantity and value; a recount button per line. */
import { Form } from "react-router";
import { formatDateTime } from "~/lib/format";
import { moneyText } from "~/lib/unit-text";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
} from "~/stock/stock-quantity-text";
import type { StocktakeReview } from "~/stocktakes/stocktake-review";
import { TableScroll } from "~/components/table-scroll";

/** Money with its sign, a true minus for less: "+42.50", "−19.74" (the variance column's style). */
const signedMoney = (value: number, currency = "") =>
  `${value > 0 ? "+" : value < 0 ? "−" : ""}${moneyText(Math.abs(value), currency)}`;

const quantity = (value: number | null, unit: string) =>
  value === null ? "—" : formatStockQuantity(value, unit);

export function ReviewTable({
  review,
  currency,
  canAskRecount,
}: {
  review: StocktakeReview;
  currency: string;
  canAskRecount: boolean;
}) {
  const { lines, totals } = review;
  return (
    <section aria-labelledby="review-heading" className="space-y-3">
      <h2 id="review-heading" className="text-lg font-semibold">
        Review
      </h2>
      <p className="text-sm text-graphite-500">
        Variance = counted − book at the moment of the count, so movements
        during the count are not counted as differences. Values at each item's
        average cost.
      </p>
      <TableScroll
        label="Review table"
        className="rounded-lg border border-rule bg-sheet"
        widerThanPanel
      >
        <table className="data-table">
          <caption className="sr-only">
            Stocktake lines with their variances
          </caption>
          <thead>
            <tr>
              <th scope="col">Location</th>
              <th scope="col">Item</th>
              <th scope="col">Lot</th>
              <th scope="col" className="text-right">
                Book at start
              </th>
              <th scope="col" className="text-right">
                Book at count
              </th>
              <th scope="col" className="text-right">
                Counted
              </th>
              <th scope="col" className="text-right">
                Variance
              </th>
              <th scope="col" className="text-right">
                Value ({currency})
              </th>
              <th scope="col">Counted by</th>
              {canAskRecount ? (
                <th scope="col">
                  <span className="sr-only">Recount</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {lines.map((line) => (
              <tr
                key={line.id}
                className={line.varianceQuantity ? "bg-copper-50" : undefined}
              >
                <td className="font-medium">{line.location}</td>
                <td>
                  <span className="font-medium">{line.sku}</span>{" "}
                  <span className="text-graphite-500">{line.name}</span>
                  {line.addedDuringCount ? (
                    <span className="block text-xs text-caution">
                      found on the shelf
                    </span>
                  ) : null}
                </td>
                <td>{line.lot ?? "—"}</td>
                <td className="text-right whitespace-nowrap">
                  {quantity(line.bookAtStart, line.unit)}
                </td>
                <td className="text-right whitespace-nowrap">
                  {quantity(line.bookAtCount, line.unit)}
                </td>
                <td className="text-right whitespace-nowrap">
                  {line.recountRequested ? (
                    <span className="text-caution">recount asked</span>
                  ) : (
                    quantity(line.counted, line.unit)
                  )}
                  {line.grossKg !== null && line.tareKg !== null ? (
                    <span className="block text-xs text-graphite-500">
                      weighed {formatStockQuantity(line.grossKg, "kg")} − tare{" "}
                      {formatStockQuantity(line.tareKg, "kg")}
                    </span>
                  ) : null}
                </td>
                <td className="text-right whitespace-nowrap font-medium">
                  {line.varianceQuantity === null
                    ? "—"
                    : formatSignedStockQuantity(
                        line.varianceQuantity,
                        line.unit,
                      )}
                </td>
                <td className="text-right whitespace-nowrap">
                  {line.varianceValue === null
                    ? "—"
                    : signedMoney(line.varianceValue)}
                </td>
                <td className="whitespace-nowrap text-xs">
                  {line.countedBy ? (
                    <>
                      {line.countedBy}
                      <span className="block text-graphite-500">
                        {formatDateTime(line.countedAt)}
                      </span>
                    </>
                  ) : (
                    "—"
                  )}
                </td>
                {canAskRecount ? (
                  <td>
                    {line.counted !== null ? (
                      <Form method="post">
                        <input type="hidden" name="intent" value="recount" />
                        <input type="hidden" name="lineId" value={line.id} />
                        <button
                          type="submit"
                          className="button-quiet whitespace-nowrap"
                          aria-label={`Ask for a recount of ${line.sku}${line.lot ? ` lot ${line.lot}` : ""} at ${line.location}`}
                        >
                          Recount
                        </button>
                      </Form>
                    ) : null}
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" colSpan={6} className="text-right">
                {totals.differences} of {totals.lines} lines differ · found over{" "}
                {moneyText(totals.gainValue, currency)} · short{" "}
                {moneyText(Math.abs(totals.lossValue), currency)}
              </th>
              <th scope="col" className="text-right">
                Net
              </th>
              <td className="text-right font-semibold whitespace-nowrap">
                {signedMoney(totals.netValue, currency)}
              </td>
              <td colSpan={canAskRecount ? 2 : 1} />
            </tr>
          </tfoot>
        </table>
      </TableScroll>
    </section>
  );
}
