import { data, Link } from "react-router";
import type { Route } from "./+types/stocktake-print";
import { requireCapability } from "~/auth/guard.server";
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
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `Count sheet ${loaderData ? loaderData.stocktake.reference : ""} (print) · Turnledger`,
  },
];

const writeIn = "h-9 border-l border-graphite-300 print:border-graphite-700";

/** The blind count sheet on A4: what to count, with columns to write in. */
export default function StocktakePrint({ loaderData }: Route.ComponentProps) {
  const { stocktake, sheet } = loaderData;
  return (
    <div className="space-y-5">
      <style>{"@page { size: A4 portrait; margin: 12mm; }"}</style>
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link
          to={`/stocktakes/${stocktake.id}`}
          className="text-sm text-copper-700 underline underline-offset-2"
        >
          ← Back to {stocktake.reference}
        </Link>
        <button
          type="button"
          className="button-primary"
          onClick={() => window.print()}
        >
          Print
        </button>
      </div>
      <article className="mx-auto max-w-[190mm] bg-white p-6 text-sm text-graphite-900 shadow-xs print:max-w-none print:p-0 print:shadow-none">
        <header className="mb-4 flex items-baseline justify-between border-b-2 border-graphite-900 pb-2">
          <h1 className="text-xl font-semibold">
            Count sheet {stocktake.reference}
          </h1>
          <p>Started {formatDateTime(stocktake.startedAt)}</p>
        </header>
        <p className="mb-3">
          Count what is on the shelf; write the quantity, or a spool's gross
          weight and tare. Counted by: ____________________ Date: ___________
        </p>
        {sheet.map((location) => (
          <section key={location.code} className="mb-5 break-inside-avoid-page">
            <h2 className="mb-1 text-base font-semibold">
              {location.code}{" "}
              <span className="font-normal">{location.name}</span>
            </h2>
            <table className="w-full border-collapse border border-graphite-700">
              <thead>
                <tr className="bg-graphite-50 text-left">
                  <th
                    scope="col"
                    className="border border-graphite-700 px-2 py-1"
                  >
                    Item
                  </th>
                  <th
                    scope="col"
                    className="border border-graphite-700 px-2 py-1"
                  >
                    Lot
                  </th>
                  <th
                    scope="col"
                    className="border border-graphite-700 px-2 py-1"
                  >
                    Unit
                  </th>
                  <th
                    scope="col"
                    className="w-[24mm] border border-graphite-700 px-2 py-1"
                  >
                    Counted
                  </th>
                  <th
                    scope="col"
                    className="w-[20mm] border border-graphite-700 px-2 py-1"
                  >
                    Gross kg
                  </th>
                  <th
                    scope="col"
                    className="w-[20mm] border border-graphite-700 px-2 py-1"
                  >
                    Tare kg
                  </th>
                  <th
                    scope="col"
                    className="w-[16mm] border border-graphite-700 px-2 py-1"
                  >
                    Initials
                  </th>
                </tr>
              </thead>
              <tbody>
                {location.lines.map((line) => (
                  <tr key={line.id} className="break-inside-avoid">
                    <td className="border border-graphite-700 px-2 py-1">
                      <span className="font-medium">{line.sku}</span>{" "}
                      {line.name}
                    </td>
                    <td className="border border-graphite-700 px-2 py-1">
                      {line.lot ?? "—"}
                    </td>
                    <td className="border border-graphite-700 px-2 py-1">
                      {line.unit}
                    </td>
                    <td className={`${writeIn} border border-graphite-700`} />
                    <td
                      className={`${writeIn} border border-graphite-700 ${line.weighable ? "" : "bg-graphite-100"}`}
                    />
                    <td
                      className={`${writeIn} border border-graphite-700 px-2 text-xs text-graphite-500 ${line.weighable ? "" : "bg-graphite-100"}`}
                    >
                      {line.weighable && line.lotTareKg !== null
                        ? `(${line.lotTareKg})`
                        : ""}
                    </td>
                    <td className={`${writeIn} border border-graphite-700`} />
                  </tr>
                ))}
                {[0, 1, 2].map((blank) => (
                  <tr key={`blank-${blank}`}>
                    {[0, 1, 2, 3, 4, 5, 6].map((cell) => (
                      <td
                        key={cell}
                        className={`${writeIn} border border-graphite-700`}
                      />
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </section>
        ))}
      </article>
    </div>
  );
}
