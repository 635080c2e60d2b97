import type { Route } from "./+types/labels-lots";
import { requireCapability } from "~/auth/guard.server";
import { LabelSheet } from "~/components/labels/label-sheet";
import { LotLabel } from "~/components/labels/lot-label";
import {
  labelSizeOr400,
  lotIdsOfReceiptOr404,
  lotLabelsOr404,
  refuseLabelAddress,
} from "~/labels/label-sheet.server";
import { lotIdsFromText } from "~/labels/label-sizes";
import { todayUtc } from "~/lib/calendar-days";
import { idFromText } from "~/lib/search-params";

/**
 * Labels of several lots, an A4 sheet unless the label printer is chosen: the lots named
 * in `?ids=1,2,3`, or every lot a delivery against a purchase order brought in
 * (`?receipt=<receipt id>`, the link after receiving).
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "printLabels");
  const params = new URL(request.url).searchParams;
  const size = labelSizeOr400(request, "a4");
  const receipt = params.get("receipt");
  let lotIds: number[];
  if (receipt !== null) {
    const receiptId = idFromText(receipt);
    if (receiptId === null)
      refuseLabelAddress("The delivery is named by its number: ?receipt=12.");
    lotIds = await lotIdsOfReceiptOr404(receiptId);
  } else {
    lotIds =
      lotIdsFromText(params.get("ids")) ??
      refuseLabelAddress(
        "Name the lots by their ids, at most 60: ?ids=12,13,14.",
      );
  }
  return { size, lots: await lotLabelsOr404(lotIds), printedOn: todayUtc() };
}

export const meta: Route.MetaFunction = () => [
  { title: "Lot labels · Turnledger" },
];

export default function LotLabels({ loaderData }: Route.ComponentProps) {
  const { size, lots, printedOn } = loaderData;
  return (
    <LabelSheet
      title={`Labels of ${lots.length === 1 ? "1 lot" : `${lots.length} lots`}`}
      size={size}
      back={null}
      sizeHref={(each) =>
        `/labels/lots?${new URLSearchParams({ ids: lots.map((lot) => lot.lotId).join(","), size: each })}`
      }
    >
      {lots.map((lot) => (
        <LotLabel key={lot.lotId} lot={lot} printedOn={printedOn} />
      ))}
    </LabelSheet>
  );
}
