/**
 * The geometry of the item page's price-history chart: one step line per offer (a price
 * stands until the next change), broken on the days with no price, round-numbered price
 * ticks, date ticks, a marker at each change and a label beside the right end of each
 * line. Each offer has its own dash pattern and marker shape, so the chart reads in black
 * and white and without telling colours apart. Pure: no I/O, no framework.
 */
import { roundStep, type ChartFrame } from "~/lib/chart-frame";
import {
  addMonths,
  dateOfDayNumber,
  dayNumber,
  monthStartOnOrAfter,
  type CalendarDate,
} from "~/lib/calendar-days";

export type { ChartFrame };

/** One price of an offer: it stands from `date` until the next point; null: no price. */
export interface ChartPoint {
  date: CalendarDate;
  unitPrice: number | null;
}

export type MarkerShape =
  "circle" | "square" | "triangle" | "diamond" | "cross" | "triangle-down";

export interface SeriesStyle {
  /** SVG stroke-dasharray; "" for a solid line. */
  dash: string;
  marker: MarkerShape;
}

const dashes = ["", "9 4", "2 3", "10 3 2 3", "5 5", "1 5"] as const;
const markers: readonly MarkerShape[] = [
  "circle",
  "square",
  "triangle",
  "diamond",
  "cross",
  "triangle-down",
];

/**
 * The line and marker of the offer at `index`. The first six differ in both; after that
 * the markers shift by one per round, so no two of the first 36 look alike.
 */
export function seriesStyle(index: number): SeriesStyle {
  const round = Math.floor(index / dashes.length);
  return {
    dash: dashes[index % dashes.length]!,
    marker: markers[(index + round) % markers.length]!,
  };
}

export interface ChartMarker {
  x: number;
  y: number;
  date: CalendarDate;
  unitPrice: number;
}

export interface SeriesLayout {
  style: SeriesStyle;
  /** SVG path of the step line, one subpath per run of prices; "" when never priced. */
  path: string;
  /** One marker where each price starts. */
  markers: ChartMarker[];
  /** Height of the last price, where the line ends; null when never priced. */
  endY: number | null;
  /** Height of the label beside the plot, moved clear of the other labels; null when never priced. */
  labelY: number | null;
}

export interface PriceHistoryChartLayout {
  /** First and last day on the time axis. */
  start: CalendarDate;
  end: CalendarDate;
  /** Price ticks, bottom up. */
  valueTicks: { value: number; y: number }[];
  /** Decimals that show every tick value exactly. */
  valueDecimals: number;
  /** Date ticks: month starts on a long axis, else the first, middle and last day. */
  dateTicks: {
    date: CalendarDate;
    x: number;
    anchor: "start" | "middle" | "end";
  }[];
  /** True when the date ticks are month starts (label them by month). */
  monthTicks: boolean;
  series: SeriesLayout[];
}

/** The shortest time axis: prices of the last few days are not stretched across the plot. */
const shortestSpanDays = 7;
/** Vertical room per label beside the plot, px. */
export const labelSpacing = 14;

const round = (value: number) => Math.round(value * 10) / 10;
/** Tick values without binary noise: 0.30000000000000004 → 0.3. */
const clean = (value: number) => Number(value.toPrecision(12));

/**
 * The chart of every offer from the first price shown to `end` (today). Null when no offer
 * has a price on any day shown, so there is nothing to draw.
 */
export function priceHistoryChart(
  series: readonly { points: readonly ChartPoint[] }[],
  end: CalendarDate,
  frame: ChartFrame,
): PriceHistoryChartLayout | null {
  const prices = series.flatMap((offer) =>
    offer.points.flatMap((point) =>
      point.unitPrice === null ? [] : [point.unitPrice],
    ),
  );
  if (prices.length === 0) return null;

  const dates = series.flatMap((offer) =>
    offer.points.map((point) => point.date),
  );
  const endDay = Math.max(dayNumber(end), ...dates.map(dayNumber));
  const startDay = Math.min(endDay - shortestSpanDays, ...dates.map(dayNumber));
  const plotLeft = frame.left;
  const plotRight = frame.width - frame.right;
  const plotTop = frame.top;
  const plotBottom = frame.height - frame.bottom;
  const x = (date: CalendarDate) =>
    round(
      plotLeft +
        ((dayNumber(date) - startDay) / (endDay - startDay)) *
          (plotRight - plotLeft),
    );

  const axis = valueAxis(Math.min(...prices), Math.max(...prices));
  const y = (value: number) =>
    round(
      plotBottom -
        ((value - axis.bottom) / (axis.top - axis.bottom)) *
          (plotBottom - plotTop),
    );

  const endDate = dateOfDayNumber(endDay);
  const laidOut = series.map((offer, index) => {
    let path = "";
    let open = false;
    let last: number | null = null;
    const shown: ChartMarker[] = [];
    for (const point of offer.points) {
      const at = x(point.date);
      if (point.unitPrice === null) {
        if (open) path += ` H${at}`;
        open = false;
        continue;
      }
      const height = y(point.unitPrice);
      path += open
        ? ` H${at} V${height}`
        : `${path ? " " : ""}M${at},${height}`;
      open = true;
      last = height;
      shown.push({
        x: at,
        y: height,
        date: point.date,
        unitPrice: point.unitPrice,
      });
    }
    if (open) path += ` H${x(endDate)}`;
    return {
      style: seriesStyle(index),
      path,
      markers: shown,
      endY: last,
      labelY: null as number | null,
    };
  });

  const labelHeights = spreadLabels(
    laidOut.map((offer) => offer.endY),
    plotTop,
    plotBottom,
  );
  laidOut.forEach((offer, index) => {
    offer.labelY = labelHeights[index] ?? null;
  });

  return {
    start: dateOfDayNumber(startDay),
    end: endDate,
    valueTicks: axis.ticks.map((value) => ({ value, y: y(value) })),
    valueDecimals: axis.decimals,
    ...dateTicks(startDay, endDay, x),
    series: laidOut,
  };
}

/**
 * A price axis from a round value below the lowest price to one above the highest, so no
 * line runs along the frame. A single price sits in the middle. Never below 0 for prices
 * that are not.
 */
export function valueAxis(
  lowest: number,
  highest: number,
): { bottom: number; top: number; ticks: number[]; decimals: number } {
  const spread = highest - lowest;
  const step = roundStep(
    spread > 0 ? spread : Math.max(Math.abs(highest) * 0.1, 0.0001),
    4,
  );
  let bottom = clean(Math.floor(lowest / step + 1e-9) * step);
  let top = clean(Math.ceil(highest / step - 1e-9) * step);
  if (lowest - bottom < step * 0.1) bottom = clean(bottom - step);
  if (top - highest < step * 0.1) top = clean(top + step);
  if (lowest >= 0 && bottom < 0) bottom = 0;
  const ticks: number[] = [];
  for (let index = 0; bottom + index * step <= top + step / 2; index += 1) {
    ticks.push(clean(bottom + index * step));
  }
  return {
    bottom,
    top,
    ticks,
    decimals: Math.max(0, -Math.floor(Math.log10(step) + 1e-9)),
  };
}

/** Month starts every 1, 2, 3, 6 or 12 months (at most 7) on a long axis; else first, middle, last day. */
function dateTicks(
  startDay: number,
  endDay: number,
  x: (date: CalendarDate) => number,
): Pick<PriceHistoryChartLayout, "dateTicks" | "monthTicks"> {
  const months: CalendarDate[] = [];
  for (
    let month = monthStartOnOrAfter(dateOfDayNumber(startDay));
    dayNumber(month) <= endDay;
    month = addMonths(month, 1)
  ) {
    months.push(month);
  }
  if (months.length >= 3) {
    const every = [1, 2, 3, 6, 12].find(
      (candidate) => months.length / candidate <= 7,
    )!;
    const chosen = months.filter(
      (month) => (Number(month.slice(5, 7)) - 1) % every === 0,
    );
    const left = x(dateOfDayNumber(startDay));
    const right = x(dateOfDayNumber(endDay));
    return {
      monthTicks: true,
      dateTicks: chosen.map((date) => {
        const at = x(date);
        return {
          date,
          x: at,
          anchor: at - left < 24 ? "start" : right - at < 24 ? "end" : "middle",
        };
      }),
    };
  }
  const middle = dateOfDayNumber(Math.round((startDay + endDay) / 2));
  return {
    monthTicks: false,
    dateTicks: [
      {
        date: dateOfDayNumber(startDay),
        x: x(dateOfDayNumber(startDay)),
        anchor: "start",
      },
      { date: middle, x: x(middle), anchor: "middle" },
      {
        date: dateOfDayNumber(endDay),
        x: x(dateOfDayNumber(endDay)),
        anchor: "end",
      },
    ],
  };
}

/**
 * Label heights beside the plot: each as near its line's end as it can be, at least
 * `labelSpacing` apart, inside top…bottom when they fit. Null stays null.
 */
export function spreadLabels(
  wanted: readonly (number | null)[],
  top: number,
  bottom: number,
): (number | null)[] {
  const order = wanted
    .map((height, index) => ({ height, index }))
    .filter(
      (entry): entry is { height: number; index: number } =>
        entry.height !== null,
    )
    .sort((a, b) => a.height - b.height || a.index - b.index);
  const placed = order.map((entry) => entry.height);
  for (let index = 0; index < placed.length; index += 1) {
    const floor = index === 0 ? top : placed[index - 1]! + labelSpacing;
    placed[index] = Math.max(placed[index]!, floor);
  }
  for (let index = placed.length - 1; index >= 0; index -= 1) {
    const ceiling =
      index === placed.length - 1 ? bottom : placed[index + 1]! - labelSpacing;
    placed[index] = Math.min(placed[index]!, ceiling);
  }
  const result: (number | null)[] = wanted.map(() => null);
  order.forEach((entry, index) => {
    result[entry.index] = round(placed[index]!);
  });
  return result;
}

/** An SVG path for a marker of about `size` px across, centred on x, y. */
export function markerPath(
  shape: MarkerShape,
  x: number,
  y: number,
  size = 8,
): string {
  const r = size / 2;
  const p = (dx: number, dy: number) => `${round(x + dx)},${round(y + dy)}`;
  switch (shape) {
    case "circle":
      return `M${p(-r, 0)} A${r},${r} 0 1,0 ${p(r, 0)} A${r},${r} 0 1,0 ${p(-r, 0)} Z`;
    case "square": {
      const s = r * 0.85;
      return `M${p(-s, -s)} L${p(s, -s)} L${p(s, s)} L${p(-s, s)} Z`;
    }
    case "triangle":
      return `M${p(0, -r * 1.15)} L${p(r * 1.1, r * 0.8)} L${p(-r * 1.1, r * 0.8)} Z`;
    case "triangle-down":
      return `M${p(0, r * 1.15)} L${p(r * 1.1, -r * 0.8)} L${p(-r * 1.1, -r * 0.8)} Z`;
    case "diamond":
      return `M${p(0, -r * 1.25)} L${p(r * 1.05, 0)} L${p(0, r * 1.25)} L${p(-r * 1.05, 0)} Z`;
    case "cross":
      return `M${p(-r, -r)} L${p(r, r)} M${p(r, -r)} L${p(-r, r)}`;
  }
}
