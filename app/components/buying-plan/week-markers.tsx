/** One week's marks on the projected-stock chart: the build orders' need (downward triangle), open orders due (upward triangle), the suggested arrival (diamond), each with its figure as a tooltip. */
import { GlyphDiamond, GlyphTriangle } from "@visx/glyph";
import type { ProjectionPoint } from "~/buying-plan/projection-chart";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

const glyph = Math.PI * 4.5 ** 2;

export function WeekMarkers({
  point,
  zeroY,
  unit,
}: {
  point: ProjectionPoint;
  zeroY: number;
  unit: string;
}) {
  return (
    <g>
      {point.needed > 0 ? (
        <g transform={`rotate(180 ${point.x - 12} ${zeroY + 10})`}>
          <title>{`Needed: ${formatStockQuantity(point.needed, unit)}`}</title>
          <GlyphTriangle
            left={point.x - 12}
            top={zeroY + 10}
            size={glyph}
            className="fill-danger"
          />
        </g>
      ) : null}
      {point.arriving > 0 ? (
        <g>
          <title>{`On order, due: ${formatStockQuantity(point.arriving, unit)}`}</title>
          <GlyphTriangle
            left={point.x + 12}
            top={zeroY - 10}
            size={glyph}
            className="fill-field"
          />
        </g>
      ) : null}
      {point.suggested > 0 ? (
        <g>
          <title>{`Suggested: ${formatStockQuantity(point.suggested, unit)}`}</title>
          <GlyphDiamond
            left={point.x}
            top={point.withY}
            size={glyph * 1.4}
            className="fill-sheet stroke-copper-700"
            strokeWidth={2}
          />
        </g>
      ) : null}
    </g>
  );
}
