import type { Route } from "./+types/labels-locations";
import { requireCapability } from "~/auth/guard.server";
import { LabelSheet } from "~/components/labels/label-sheet";
import { LocationLabel } from "~/components/labels/location-label";
import {
  labelSizeOr400,
  locationLabelsOr404,
  refuseLabelAddress,
} from "~/labels/label-sheet.server";
import { locationCodesFromText } from "~/labels/label-sizes";

/** Labels of several bins or stores (`?codes=WIRE-A1,WIRE-A2`), an A4 sheet unless the label printer is chosen. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "printLabels");
  const size = labelSizeOr400(request, "a4");
  const codes =
    locationCodesFromText(new URL(request.url).searchParams.get("codes")) ??
    refuseLabelAddress(
      "Name the locations by their codes, at most 60: ?codes=WIRE-A1,WIRE-A2.",
    );
  return { size, locations: await locationLabelsOr404(codes) };
}

export const meta: Route.MetaFunction = () => [
  { title: "Location labels · Turnledger" },
];

export default function LocationLabels({ loaderData }: Route.ComponentProps) {
  const { size, locations } = loaderData;
  return (
    <LabelSheet
      title={`Labels of ${locations.length === 1 ? "1 location" : `${locations.length} locations`}`}
      size={size}
      back={null}
      sizeHref={(each) =>
        `/labels/locations?${new URLSearchParams({ codes: locations.map((location) => location.code).join(","), size: each })}`
      }
    >
      {locations.map((location) => (
        <LocationLabel key={location.code} location={location} />
      ))}
    </LabelSheet>
  );
}
