import type { Route } from "./+types/label-lot";
import { requireCapability } from "~/auth/guard.server";
import { LabelSheet } from "~/components/labels/label-sheet";
import { LotLabel } from "~/components/labels/lot-label";
import { labelSizeOr400, lotLabelsOr404 } from "~/labels/label-sheet.server";
import { todayUtc } from "~/lib/calendar-days";
import { idFromText } from "~/lib/search-params";

/** One lot's label: a spool or a magnet batch, for the label printer unless A4 is chosen. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireCapability(request, "printLabels");
  const size = labelSizeOr400(request, "62x100");
  const lotId = idFromText(params.lotId);
  const [lot] = await lotLabelsOr404(lotId === null ? [] : [lotId]);
  return { size, lot: lot!, printedOn: todayUtc() };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `Label of lot ${loaderData.lot.lotNumber}` : "Lot label"} · Turnledger`,
  },
];

export default function LotLabelPage({ loaderData }: Route.ComponentProps) {
  const { size, lot, printedOn } = loaderData;
  return (
    <LabelSheet
      title={`Label of lot ${lot.lotNumber} · ${lot.sku}`}
      size={size}
      back={{ to: `/stock/lots/${lot.lotId}`, text: "The lot's page" }}
      sizeHref={(each) => `/labels/lots/${lot.lotId}?size=${each}`}
    >
      <LotLabel lot={lot} printedOn={printedOn} />
    </LabelSheet>
  );
}
