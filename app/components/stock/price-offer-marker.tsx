/**
 * How a supplier article is told apart on the item page's price history: its line colour,
 * and its marker (hollow, so overlapping markers stay readable; the shapes and sizes of
 * the insight trend chart's markers) drawn with visx glyphs; and the legend's key.
 */
import {
  GlyphCircle,
  GlyphCross,
  GlyphDiamond,
  GlyphSquare,
  GlyphTriangle,
} from "@visx/glyph";
import { Line } from "@visx/shape";
import type { SeriesStyle } from "~/pricing/price-history-chart";

/** Line colours from the palette; the dash and marker tell offers apart without them. */
const strokeClasses = [
  "stroke-graphite-900",
  "stroke-copper-600",
  "stroke-field",
  "stroke-ok",
  "stroke-caution",
  "stroke-graphite-500",
];

/** The stroke colour class of the offer at `index`. */
export function offerStrokeClass(index: number): string {
  return strokeClasses[index % strokeClasses.length]!;
}

/** The colour of an offer's marker where it is filled (the cross), as its line. */
const fillClasses = [
  "fill-graphite-900",
  "fill-copper-600",
  "fill-field",
  "fill-ok",
  "fill-caution",
  "fill-graphite-500",
];

/**
 * The marker of an offer, hollow so overlapping markers stay readable: the shapes and
 * sizes of the insight trend chart's markers, in the offer's colour classes.
 */
export function OfferMarker({
  style,
  x,
  y,
  index,
}: {
  style: SeriesStyle;
  x: number;
  y: number;
  /** The offer's place: its colour. */
  index: number;
}) {
  const stroke = offerStrokeClass(index);
  const common = {
    left: x,
    top: y,
    size: 48,
    strokeWidth: 1.75,
    className: `${stroke} fill-sheet`,
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
      return (
        <GlyphCross
          {...common}
          size={36}
          strokeWidth={0.5}
          className={`${stroke} ${fillClasses[index % fillClasses.length]!}`}
        />
      );
  }
}

/** A short piece of the offer's line with its marker: the legend's key. */
export function OfferLineSample({
  style,
  index,
}: {
  style: SeriesStyle;
  index: number;
}) {
  return (
    <svg
      viewBox="0 0 36 12"
      width={36}
      height={12}
      aria-hidden="true"
      className="shrink-0"
    >
      <Line
        from={{ x: 1, y: 6 }}
        to={{ x: 35, y: 6 }}
        className={offerStrokeClass(index)}
        strokeWidth={2}
        strokeDasharray={style.dash || undefined}
      />
      <OfferMarker style={style} x={18} y={6} index={index} />
    </svg>
  );
}
