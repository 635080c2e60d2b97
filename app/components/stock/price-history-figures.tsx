/**
 * The price history's figures, folded away: every price of every supplier article from
 * its day, in the company currency and as quoted, and why a day has no price.
 */
import { createColumnHelper } from "~/lib/table-columns";
import { DataTable } from "~/components/data-table";
import { perUnitWord } from "~/lib/unit-text";
import {
  offerName,
  pricePerUnit,
  type PriceHistoryView,
  type PriceOffer,
} from "~/stock/price-history-texts";
import { formatDay } from "~/lib/format";

export function PriceHistoryFigures({
  history,
  quantity,
}: {
  history: PriceHistoryView;
  /** The quantity priced, in words: "25.000 kg". */
  quantity: string;
}) {
  const currency = history.companyCurrency;
  const unitWord = perUnitWord(history.unit);
  return (
    <details className="text-sm">
      <summary className="cursor-pointer font-medium text-graphite-800 touch:py-3">
        Figures of the price history
      </summary>
      <div className="mt-2">
        <DataTable
          caption={`Unit price of ${quantity} by supplier article and date, in ${currency} per ${unitWord}`}
          columns={figureColumns(currency, history.unit)}
          rows={history.series.flatMap((offer) =>
            offer.points.map((point) => ({
              ...point,
              offer: offerName(offer),
              currency: offer.currency,
            })),
          )}
        />
      </div>
    </details>
  );
}

type FigureRow = PriceOffer["points"][number] & {
  offer: string;
  currency: string;
};

function figureColumns(companyCurrency: string, unit: string) {
  const column = createColumnHelper<FigureRow>();
  return [
    column.accessor("offer", { header: "Supplier article" }),
    column.accessor("date", {
      header: "From",
      cell: (info) => (
        <span className="whitespace-nowrap">{formatDay(info.getValue())}</span>
      ),
    }),
    column.accessor("unitPrice", {
      header: `Unit price in ${companyCurrency}`,
      cell: (info) => {
        const value = info.getValue();
        return value === null ? (
          <span className="text-graphite-500">no price</span>
        ) : (
          <span className="whitespace-nowrap">
            {pricePerUnit(value, companyCurrency, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "quoted",
      header: "As quoted",
      cell: ({ row }) => {
        const { quotedUnitPrice, currency } = row.original;
        return quotedUnitPrice === null || currency === companyCurrency ? (
          "—"
        ) : (
          <span className="whitespace-nowrap">
            {pricePerUnit(quotedUnitPrice, currency, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("problems", {
      header: "Why no price",
      cell: (info) => info.getValue().join("; ") || "—",
    }),
  ];
}
