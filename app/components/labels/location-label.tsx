/** A bin or store location's label: its code large, its name and the QR code to scan. */
import type { LocationLabel as LocationLabelData } from "~/labels/label-types";
import { LabelCode, LabelFrame } from "./label-sheet";

export function LocationLabel({ location }: { location: LocationLabelData }) {
  return (
    <LabelFrame label={`Label of location ${location.code}`}>
      <p className="text-[3mm] text-graphite-600">
        {location.kind === "bin" ? "Bin" : "Store"}
      </p>
      <h2 className="font-mono text-[9mm] leading-none font-bold break-all">
        {location.code}
      </h2>
      <p className="mt-[1.5mm] text-[4mm] leading-tight">{location.name}</p>
      <div className="mt-auto flex flex-col items-center">
        <LabelCode
          scan={location.scan}
          sizeMm={46}
          what={`location ${location.code}`}
        />
        <p className="mt-[1mm] text-center text-[2.6mm] text-graphite-600">
          Scan to record a movement here
        </p>
      </div>
    </LabelFrame>
  );
}
