import { palette } from "../insight-patterns";
import {
  type CostChartRow,
  costValueText,
  estimatedNote,
  incompleteNote,
} from "./cost-chart-layout";

/**
 * A design's texts in the cost chart: its name above its bar, its total at the bar's end
 * (`end`), and under the total why it is not comparable or where its torque came from.
 */
export function CostChartRowText({
  row,
  currency,
  barTop,
  barMiddle,
  end,
}: {
  row: CostChartRow;
  currency: string;
  barTop: number;
  barMiddle: number;
  end: number;
}) {
  return (
    <g>
      <text x={0} y={barTop - 5} fontSize={11} fill={palette.graphite900}>
        {row.label}
      </text>
      <text
        x={end + 6}
        y={barMiddle + (row.complete && !row.estimated ? 4 : -1)}
        fontSize={12}
        fontWeight={600}
        fill={palette.graphite900}
      >
        {costValueText(row, currency)}
      </text>
      {row.costPerNm !== null && !row.complete ? (
        <text
          x={end + 6}
          y={barMiddle + 11}
          fontSize={10}
          fill={palette.caution}
        >
          {incompleteNote}
        </text>
      ) : row.costPerNm !== null && row.estimated ? (
        <text
          x={end + 6}
          y={barMiddle + 11}
          fontSize={10}
          fill={palette.graphite700}
        >
          {estimatedNote}
        </text>
      ) : null}
    </g>
  );
}
