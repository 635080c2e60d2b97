/**
 * A stocked magnet's dimensions as the item page shows them. Its own module, so the
 * page does not load the engineering modules the stock figures are worked out with
 * (stocked-item-figures.ts re-exports it).
 */
import type { MagnetShape } from "~/engineering/magnet-estimate";
import { formatNumber } from "~/lib/format";

/** The dimensions of a shape as people read them: "length 20 mm × width 10 mm × height 5 mm". */
export function magnetDimensionsText(shape: MagnetShape): string {
  const mm = (value: number) => `${formatNumber(value, 3)}\u00a0mm`;
  switch (shape.kind) {
    case "block":
      return `length ${mm(shape.lengthMm)} × width ${mm(shape.widthMm)} × height ${mm(shape.heightMm)}`;
    case "arc":
      return `outer radius ${mm(shape.outerRadiusMm)}, inner radius ${mm(shape.innerRadiusMm)}, angle ${formatNumber(shape.angleDeg)}°, axial length ${mm(shape.axialLengthMm)}`;
    case "disc":
      return `diameter ${mm(shape.diameterMm)} × thickness ${mm(shape.thicknessMm)}`;
    case "ring":
      return `outer diameter ${mm(shape.outerDiameterMm)}, inner diameter ${mm(shape.innerDiameterMm)} × thickness ${mm(shape.thicknessMm)}`;
  }
}
