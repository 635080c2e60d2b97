/** The stacked bars of the cost-per-N·m chart: one bar per charted design, by part. */
import { BarStackHorizontal } from "@visx/shape";
import type { scaleBand, scaleLinear } from "@visx/scale";
import { splitKeys, type SplitKey } from "~/insight/design-insight";
import { fillOf, palette, splitParts } from "../insight-patterns";
import { type ChartedRow, perNmText } from "./cost-chart-layout";

type StackDatum = Record<SplitKey, number> & { key: string };

function partLabel(key: SplitKey): string {
  return splitParts.find((part) => part.key === key)!.label;
}

export function CostChartBars({
  charted,
  xScale,
  yScale,
  prefix,
  currency,
}: {
  charted: ChartedRow[];
  xScale: ReturnType<typeof scaleLinear<number>>;
  yScale: ReturnType<typeof scaleBand<string>>;
  /** The pattern ids' prefix (usePatternPrefix). */
  prefix: string;
  currency: string;
}) {
  const data: StackDatum[] = charted.map((row) => ({
    key: row.key,
    ...row.splitPerNm,
  }));
  return (
    <BarStackHorizontal<StackDatum, SplitKey>
      data={data}
      keys={[...splitKeys]}
      y={(datum) => datum.key}
      xScale={xScale}
      yScale={yScale}
      color={(key) =>
        fillOf(
          prefix,
          splitParts.find((part) => part.key === key)!,
        )
      }
    >
      {(stacks) =>
        stacks.map((stack) =>
          stack.bars.map((bar) =>
            bar.width > 0 ? (
              <rect
                key={`${stack.key}-${bar.bar.data.key}`}
                x={bar.x}
                y={bar.y}
                width={bar.width}
                height={bar.height}
                fill={bar.color}
                stroke={palette.sheet}
                strokeWidth={1}
              >
                <title>{`${partLabel(stack.key)}: ${perNmText(bar.bar.data[stack.key], currency)}`}</title>
              </rect>
            ) : null,
          ),
        )
      }
    </BarStackHorizontal>
  );
}
