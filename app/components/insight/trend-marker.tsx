/**
 * How the trend chart tells its series apart: a colour from the palette, a dash pattern
 * and a hollow marker shape (the same styles as the item page's price history), and the
 * legend's key drawn the same way.
 */
import {
  GlyphCircle,
  GlyphCross,
  GlyphDiamond,
  GlyphSquare,
  GlyphTriangle,
} from "@visx/glyph";
import { seriesStyle, type SeriesStyle } from "~/pricing/price-history-chart";
import { palette } from "../insight-patterns";

/** Line colours from the palette; the dash and marker tell the series apart without them. */
const strokes = [
  palette.graphite900,
  palette.copper600,
  palette.field,
  palette.ok,
  palette.caution,
  palette.graphite500,
];

/** The line colour of the series at `index`. */
export function trendStroke(index: number): string {
  return strokes[index % strokes.length]!;
}

/** The marker of a series, hollow so overlapping markers stay readable. */
export function TrendMarker({
  style,
  x,
  y,
  stroke,
}: {
  style: SeriesStyle;
  x: number;
  y: number;
  stroke: string;
}) {
  const common = {
    left: x,
    top: y,
    size: 48,
    stroke,
    strokeWidth: 1.75,
    fill: style.marker === "cross" ? stroke : palette.sheet,
  };
  switch (style.marker) {
    case "circle":
      return <GlyphCircle {...common} />;
    case "square":
      return <GlyphSquare {...common} />;
    case "triangle":
      return <GlyphTriangle {...common} />;
    case "triangle-down":
      return (
        <g transform={`rotate(180 ${x} ${y})`}>
          <GlyphTriangle {...common} />
        </g>
      );
    case "diamond":
      return <GlyphDiamond {...common} />;
    case "cross":
      return <GlyphCross {...common} size={36} strokeWidth={0.5} />;
  }
}

/** A short piece of a series' line with its marker: the legend's key. */
export function TrendSample({ index }: { index: number }) {
  const style = seriesStyle(index);
  const stroke = trendStroke(index);
  return (
    <svg
      viewBox="0 0 36 14"
      width={36}
      height={14}
      aria-hidden="true"
      className="inline-block shrink-0"
    >
      <line
        x1={1}
        x2={35}
        y1={7}
        y2={7}
        stroke={stroke}
        strokeWidth={2}
        strokeDasharray={style.dash || undefined}
      />
      <TrendMarker style={style} x={18} y={7} stroke={stroke} />
    </svg>
  );
}
