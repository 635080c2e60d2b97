import type { Route } from "./+types/location-count-sheet";
import { requireCapability } from "~/auth/guard.server";
import { LabelCode } from "~/components/labels/label-sheet";
import { PrintSheet } from "~/components/print-page";
import { CountSheetTable } from "~/components/stocktakes/count-sheet-table";
import { locationLabelsOr404 } from "~/labels/label-sheet.server";
import { formatDateTime } from "~/lib/format";
import { countSheet } from "~/stocktakes/count-sheet";
import { listLocationBlindLines } from "~/stocktakes/location-count-sheet.server";

/**
 * A blank count sheet of one bin or store (`/stock/locations/MAIN-A3/count-sheet`):
 * every item and lot booked there, a column to write the count in and no book
 * quantity, with the location's scan code. For those who count stock, as a
 * stocktake's printed sheet is.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireCapability(request, "countStock");
  const [location] = await locationLabelsOr404([params.code.slice(0, 20)]);
  const lines = await listLocationBlindLines(location!.code);
  return {
    location: location!,
    sheet: countSheet(lines)[0] ?? null,
    printedAt: new Date().toISOString(),
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `Count sheet ${loaderData ? loaderData.location.code : ""} (print) · Turnledger`,
  },
];

export default function LocationCountSheet({
  loaderData,
}: Route.ComponentProps) {
  const { location, sheet, printedAt } = loaderData;
  return (
    <PrintSheet
      back={{ to: "/stocktakes", text: "Back to stocktakes" }}
      title={`Count sheet ${location.code}`}
      facts={[
        { label: "Location", value: `${location.code} ${location.name}` },
        { label: "Scan code", value: location.scan.text },
        { label: "Printed", value: formatDateTime(printedAt) },
      ]}
      aside={
        <LabelCode
          scan={location.scan}
          sizeMm={22}
          what={`location ${location.code}`}
        />
      }
    >
      <p className="mb-3">
        Count what is on the shelf; write the quantity, or a spool's gross
        weight and tare. Add what is there and not listed on the blank rows.
        Counted by: ____________________ Date: ___________
      </p>
      <CountSheetTable
        location={
          sheet ?? { code: location.code, name: location.name, lines: [] }
        }
        caption={`What to count at ${location.code}`}
      />
      {sheet ? null : (
        <p className="mt-2 text-graphite-500">
          Nothing is booked at {location.code}: write down anything found there.
        </p>
      )}
    </PrintSheet>
  );
}
