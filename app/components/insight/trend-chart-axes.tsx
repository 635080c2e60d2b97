/** The trend chart's grid, value axis (with its unit, scaled to k or M) and date axis. */
import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridRows } from "@visx/grid";
import type { scaleLinear, scaleUtc } from "@visx/scale";
import { axisUnits } from "~/insight/axis-units";
import { formatDay, formatQuantity } from "~/lib/format";
import { palette } from "../insight-patterns";

export function TrendChartAxes({
  xScale,
  yScale,
  highest,
  innerWidth,
  innerHeight,
  unit,
  monthly,
}: {
  xScale: ReturnType<typeof scaleUtc<number>>;
  yScale: ReturnType<typeof scaleLinear<number>>;
  /** The highest value drawn, for the axis's units when the scale has no domain. */
  highest: number;
  innerWidth: number;
  innerHeight: number;
  unit: string;
  monthly: boolean;
}) {
  const units = axisUnits(yScale.domain()[1] ?? highest);
  return (
    <>
      <GridRows
        scale={yScale}
        width={innerWidth}
        numTicks={5}
        stroke={palette.graphite700}
        strokeOpacity={0.14}
      />
      <AxisLeft
        scale={yScale}
        numTicks={5}
        stroke={palette.graphite500}
        tickStroke={palette.graphite500}
        tickFormat={(value) =>
          formatQuantity(Number(value) / units.divisor, "", units.decimals)
        }
        tickLabelProps={{
          fontSize: 11,
          fill: palette.graphite700,
          textAnchor: "end",
          dx: -2,
          dy: 4,
        }}
        label={`${units.prefix}${unit}`}
        labelOffset={52}
        labelProps={{
          fontSize: 11,
          fill: palette.graphite700,
          textAnchor: "middle",
        }}
      />
      <AxisBottom
        top={innerHeight}
        scale={xScale}
        numTicks={6}
        stroke={palette.graphite500}
        tickStroke={palette.graphite500}
        tickFormat={(value) =>
          formatDay(
            // The axis's days are UTC calendar days: the same day for every reader.
            (value as Date).toISOString().slice(0, 10),
            monthly ? "monthYear" : "dayMonth",
          )
        }
        tickLabelProps={{
          fontSize: 11,
          fill: palette.graphite700,
          textAnchor: "middle",
        }}
      />
    </>
  );
}
