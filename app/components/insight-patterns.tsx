/**
 * The fills of the insight charts: each part of a motor's cost and each kind of stock
 * has its own colour AND its own pattern (solid, diagonal lines, vertical lines, dots,
 * waves, crosshatch), drawn with @visx/pattern, so a bar reads in black-and-white print
 * and for colour-blind readers; the legend and the tables show the same swatch beside
 * the name. Colours are the app's palette (app.css), written out because SVG pattern
 * attributes take plain colours. The split keeps the meaning of the design page's bar
 * (DesignCostSplit): active copper blue, end turns copper, magnets graphite.
 */
import { PatternCircles, PatternLines, PatternWaves } from "@visx/pattern";
import { useId } from "react";
import type { SplitKey } from "~/insight/design-insight";
import type { ItemKind } from "~/db/tables/stock-enums";

export const palette = {
  sheet: "#fffdf9",
  rule: "#ddd6ca",
  graphite300: "#aab0b8",
  graphite500: "#5f6873",
  graphite700: "#39414b",
  graphite900: "#1a1e24",
  copper100: "#f4dccb",
  copper500: "#b8632e",
  copper600: "#9c4f20",
  field: "#2f6f8f",
  ok: "#2e6b3f",
  caution: "#a35c00",
} as const;

export type FillStyle =
  | { kind: "solid"; color: string }
  | {
      kind: "lines";
      background: string;
      stroke: string;
      orientation: (
        "diagonal" | "diagonalRightToLeft" | "vertical" | "horizontal"
      )[];
    }
  | { kind: "circles"; background: string; fill: string }
  | { kind: "waves"; background: string; stroke: string };

export interface FillPart<Key extends string> {
  key: Key;
  label: string;
  /** A few words on what the part is, for the legend. */
  detail: string;
  /** Name of the pattern for a screen reader or a printed legend: "diagonal lines". */
  patternName: string;
  style: FillStyle;
}

/** The parts of a motor's cost, in stacking order. */
export const splitParts: FillPart<SplitKey>[] = [
  {
    key: "activeCopper",
    label: "Active copper",
    detail: "coil sides in the field: the copper that makes torque",
    patternName: "solid",
    style: { kind: "solid", color: palette.field },
  },
  {
    key: "endTurnCopper",
    label: "End-turn copper",
    detail: "the overhangs: cost and loss, no torque",
    patternName: "diagonal lines",
    style: {
      kind: "lines",
      background: palette.copper500,
      stroke: palette.sheet,
      orientation: ["diagonal"],
    },
  },
  {
    key: "leadsAndScrap",
    label: "Leads and scrap",
    detail: "leads, start-up and cut-offs",
    patternName: "upright lines",
    style: {
      kind: "lines",
      background: palette.graphite300,
      stroke: palette.graphite900,
      orientation: ["vertical"],
    },
  },
  {
    key: "magnets",
    label: "Magnets",
    detail: "",
    patternName: "dots",
    style: {
      kind: "circles",
      background: palette.graphite700,
      fill: palette.sheet,
    },
  },
  {
    key: "parts",
    label: "Other parts",
    detail: "bearings, laminations, shafts …",
    patternName: "crosshatch",
    style: {
      kind: "lines",
      background: palette.copper100,
      stroke: palette.graphite700,
      orientation: ["diagonal", "diagonalRightToLeft"],
    },
  },
];

/** The kinds of stock item. */
export const kindParts: FillPart<ItemKind>[] = [
  {
    key: "wire",
    label: "Magnet wire",
    detail: "by the kg",
    patternName: "waves",
    style: {
      kind: "waves",
      background: palette.copper500,
      stroke: palette.sheet,
    },
  },
  {
    key: "magnet",
    label: "Magnets",
    detail: "by the piece",
    patternName: "dots",
    style: {
      kind: "circles",
      background: palette.graphite700,
      fill: palette.sheet,
    },
  },
  {
    key: "part",
    label: "Other parts",
    detail: "",
    patternName: "crosshatch",
    style: {
      kind: "lines",
      background: palette.copper100,
      stroke: palette.graphite700,
      orientation: ["diagonal", "diagonalRightToLeft"],
    },
  },
];

/** A prefix for pattern ids that is the same on the server and in the browser (useId) and valid inside url(#…). */
export function usePatternPrefix(): string {
  return `p${useId().replace(/[^A-Za-z0-9_-]/g, "")}`;
}

export function patternId(prefix: string, key: string): string {
  return `${prefix}-${key}`;
}

/** What a shape is filled with: the solid colour or the pattern's url. */
export function fillOf(prefix: string, part: FillPart<string>): string {
  return part.style.kind === "solid"
    ? part.style.color
    : `url(#${patternId(prefix, part.key)})`;
}

/** The <pattern> definitions of the parts, once per SVG. */
export function PatternDefs({
  prefix,
  parts,
}: {
  prefix: string;
  parts: readonly FillPart<string>[];
}) {
  return (
    <>
      {parts.map((part) => {
        const id = patternId(prefix, part.key);
        const style = part.style;
        switch (style.kind) {
          case "solid":
            return null;
          case "lines":
            return (
              <PatternLines
                key={part.key}
                id={id}
                width={6}
                height={6}
                background={style.background}
                stroke={style.stroke}
                strokeWidth={1.25}
                orientation={style.orientation}
              />
            );
          case "circles":
            return (
              <PatternCircles
                key={part.key}
                id={id}
                width={6}
                height={6}
                radius={1.4}
                background={style.background}
                fill={style.fill}
              />
            );
          case "waves":
            return (
              <PatternWaves
                key={part.key}
                id={id}
                width={8}
                height={8}
                background={style.background}
                stroke={style.stroke}
                strokeWidth={1.25}
                fill="none"
              />
            );
        }
      })}
    </>
  );
}

/** A small swatch of a part's fill, for legends and table rows. */
export function Swatch({ part }: { part: FillPart<string> }) {
  const prefix = usePatternPrefix();
  return (
    <svg
      viewBox="0 0 24 14"
      width={24}
      height={14}
      aria-hidden="true"
      className="inline-block shrink-0 align-[-2px] print:[print-color-adjust:exact]"
    >
      <PatternDefs prefix={prefix} parts={[part]} />
      <rect
        x={0.5}
        y={0.5}
        width={23}
        height={13}
        rx={2}
        fill={fillOf(prefix, part)}
        stroke={palette.graphite500}
      />
    </svg>
  );
}

/** The legend of a patterned chart: swatch, name, pattern named in words, detail. */
export function PatternLegend({
  parts,
  label,
}: {
  parts: readonly FillPart<string>[];
  label: string;
}) {
  return (
    <ul aria-label={label} className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
      {parts.map((part) => (
        <li key={part.key} className="flex items-center gap-2">
          <Swatch part={part} />
          <span>
            <span className="font-medium">{part.label}</span>
            <span className="text-graphite-500">
              {" "}
              ({part.patternName}){part.detail ? ` — ${part.detail}` : ""}
            </span>
          </span>
        </li>
      ))}
    </ul>
  );
}
