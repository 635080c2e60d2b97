import type { Route } from "./+types/label-location";
import { requireCapability } from "~/auth/guard.server";
import { LabelSheet } from "~/components/labels/label-sheet";
import { LocationLabel } from "~/components/labels/location-label";
import {
  labelSizeOr400,
  locationLabelsOr404,
} from "~/labels/label-sheet.server";

/** One bin or store's label, for the label printer unless A4 is chosen. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireCapability(request, "printLabels");
  const size = labelSizeOr400(request, "62x100");
  const [location] = await locationLabelsOr404([params.code.slice(0, 20)]);
  return { size, location: location! };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `Label of ${loaderData.location.code}` : "Location label"} · Turnledger`,
  },
];

export default function LocationLabelPage({
  loaderData,
}: Route.ComponentProps) {
  const { size, location } = loaderData;
  return (
    <LabelSheet
      title={`Label of location ${location.code}`}
      size={size}
      back={null}
      related={{
        to: `/stock/locations/${encodeURIComponent(location.code)}/count-sheet`,
        text: `Count sheet of ${location.code}`,
      }}
      sizeHref={(each) =>
        `/labels/locations/${encodeURIComponent(location.code)}?size=${each}`
      }
    >
      <LocationLabel location={location} />
    </LabelSheet>
  );
}
