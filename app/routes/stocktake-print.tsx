import { data } from "react-router";
import type { Route } from "./+types/stocktake-print";
import { requireCapability } from "~/auth/guard.server";
import { PrintSheet } from "~/components/print-page";
import { CountSheetTable } from "~/components/stocktakes/count-sheet-table";
import { formatDateTime } from "~/lib/format";
import { countSheet } from "~/stocktakes/count-sheet";
import { stocktakeIdFromPath } from "~/stocktakes/stocktake-reference";
import {
  findStocktakeSummary,
  listBlindLines,
} from "~/stocktakes/stocktakes.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireCapability(request, "countStock");
  const id = stocktakeIdFromPath(params.stocktakeId, (message) =>
    data({ message }, { status: 404 }),
  );
  const stocktake = await findStocktakeSummary(id);
  if (!stocktake)
    throw data({ message: `No stocktake ST-${id}.` }, { status: 404 });
  return {
    stocktake: {
      id: stocktake.id,
      reference: stocktake.reference,
      startedAt: stocktake.startedAt,
      note: stocktake.note,
    },
    sheet: countSheet(await listBlindLines(stocktake.id)),
    printedAt: new Date().toISOString(),
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `Count sheet ${loaderData ? loaderData.stocktake.reference : ""} (print) · Turnledger`,
  },
];

/** The blind count sheet on A4: what to count, with columns to write in. */
export default function StocktakePrint({ loaderData }: Route.ComponentProps) {
  const { stocktake, sheet } = loaderData;
  return (
    <PrintSheet
      back={{
        to: `/stocktakes/${stocktake.id}`,
        text: `Back to ${stocktake.reference}`,
      }}
      title={`Count sheet ${stocktake.reference}`}
      facts={[
        { label: "Started", value: formatDateTime(stocktake.startedAt) },
        { label: "Printed", value: formatDateTime(loaderData.printedAt) },
      ]}
    >
      <p className="mb-3">
        Count what is on the shelf; write the quantity, or a spool's gross
        weight and tare. Counted by: ____________________ Date: ___________
      </p>
      {sheet.map((location) => (
        <section key={location.code} className="mb-5 break-inside-avoid-page">
          <h2 className="mb-1 text-base font-semibold">
            {location.code} <span className="font-normal">{location.name}</span>
          </h2>
          <CountSheetTable
            location={location}
            caption={`What to count at ${location.code}`}
          />
        </section>
      ))}
    </PrintSheet>
  );
}
