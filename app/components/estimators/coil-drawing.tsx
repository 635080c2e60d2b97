import { formatNumber, formatQuantity } from "~/lib/format";
/**
 * A coil drawn to scale: the two active sides (in the field, they make force)
 * and the two end turns (outside it, they only add length) in distinct colours
 * and line styles, with their share of each turn labelled.
 */
export function CoilDrawing({
  activeLengthMm,
  endTurnLengthMm,
}: {
  activeLengthMm: number;
  endTurnLengthMm: number;
}) {
  const valid =
    activeLengthMm > 0 &&
    endTurnLengthMm >= 0 &&
    Number.isFinite(activeLengthMm + endTurnLengthMm);
  if (!valid) {
    return (
      <p className="flex h-64 items-center justify-center text-sm text-graphite-500">
        The drawing appears when the active and end-turn lengths are valid.
      </p>
    );
  }
  // Each end turn drawn as a half circle whose arc is the end-turn length: radius = l_end / π.
  const radius = endTurnLengthMm / Math.PI;
  const width = Math.max(2 * radius, activeLengthMm * 0.02);
  const height = activeLengthMm + 2 * radius;
  const pad = Math.max(width, height) * 0.18;
  const labelRoom = Math.max(width, height) * 0.9;
  const viewWidth = width + 2 * pad + labelRoom;
  const viewHeight = height + 2 * pad;
  const share = activeLengthMm / (activeLengthMm + endTurnLengthMm);
  const scaleBarMm = niceScaleBar(height / 3);
  const fontSize = viewHeight / 22;
  const left = pad;
  const right = pad + width;
  const top = pad + radius;
  const bottom = pad + radius + activeLengthMm;

  return (
    <figure aria-labelledby="coil-drawing-caption">
      <svg
        viewBox={`0 0 ${viewWidth} ${viewHeight}`}
        role="img"
        aria-label={`Coil to scale: active sides ${fmt(activeLengthMm)} mm, end turns ${fmt(endTurnLengthMm)} mm each; ${formatQuantity(share * 100, "", 1)} % of each turn is in the field.`}
        className="h-72 w-full"
      >
        {/* Active sides: solid, field blue. */}
        <line
          x1={left}
          y1={top}
          x2={left}
          y2={bottom}
          className="stroke-field"
          strokeWidth={3}
          vectorEffect="non-scaling-stroke"
        />
        <line
          x1={right}
          y1={top}
          x2={right}
          y2={bottom}
          className="stroke-field"
          strokeWidth={3}
          vectorEffect="non-scaling-stroke"
        />
        {/* End turns: dashed, copper. */}
        {radius > 0 ? (
          <>
            <path
              d={`M ${left} ${top} A ${radius} ${radius} 0 0 1 ${right} ${top}`}
              fill="none"
              className="stroke-copper-500"
              strokeWidth={3}
              strokeDasharray="6 4"
              vectorEffect="non-scaling-stroke"
            />
            <path
              d={`M ${left} ${bottom} A ${radius} ${radius} 0 0 0 ${right} ${bottom}`}
              fill="none"
              className="stroke-copper-500"
              strokeWidth={3}
              strokeDasharray="6 4"
              vectorEffect="non-scaling-stroke"
            />
          </>
        ) : null}
        <g fontSize={fontSize} className="fill-graphite-800">
          <text x={right + pad * 0.6} y={(top + bottom) / 2 - fontSize * 0.2}>
            active side {fmt(activeLengthMm)} mm
          </text>
          <text
            x={right + pad * 0.6}
            y={(top + bottom) / 2 + fontSize * 1.1}
            className="fill-field"
          >
            in the field: {formatQuantity(share * 100, "", 1)} %
          </text>
          <text x={right + pad * 0.6} y={pad + fontSize * 0.4}>
            end turn {fmt(endTurnLengthMm)} mm
          </text>
          <text
            x={right + pad * 0.6}
            y={pad + fontSize * 1.7}
            className="fill-copper-700"
          >
            outside it: {formatQuantity((1 - share) * 100, "", 1)} %
          </text>
        </g>
        {/* Scale bar. */}
        <g
          className="stroke-graphite-500"
          strokeWidth={1.5}
          vectorEffect="non-scaling-stroke"
        >
          <line
            x1={right + pad * 0.6}
            y1={viewHeight - pad * 0.5}
            x2={right + pad * 0.6 + scaleBarMm}
            y2={viewHeight - pad * 0.5}
            vectorEffect="non-scaling-stroke"
          />
        </g>
        <text
          x={right + pad * 0.6}
          y={viewHeight - pad * 0.5 - fontSize * 0.4}
          fontSize={fontSize * 0.85}
          className="fill-graphite-500"
        >
          {fmt(scaleBarMm)} mm
        </text>
      </svg>
      <figcaption
        id="coil-drawing-caption"
        className="mt-2 flex flex-wrap gap-x-6 gap-y-1 text-xs text-graphite-700"
      >
        <span className="inline-flex items-center gap-2">
          <svg width="28" height="6" aria-hidden="true">
            <line
              x1="0"
              y1="3"
              x2="28"
              y2="3"
              className="stroke-field"
              strokeWidth="3"
            />
          </svg>
          active sides (solid): in the field, make torque
        </span>
        <span className="inline-flex items-center gap-2">
          <svg width="28" height="6" aria-hidden="true">
            <line
              x1="0"
              y1="3"
              x2="28"
              y2="3"
              className="stroke-copper-500"
              strokeWidth="3"
              strokeDasharray="6 4"
            />
          </svg>
          end turns (dashed): length, resistance and cost only
        </span>
      </figcaption>
    </figure>
  );
}

function fmt(value: number): string {
  return formatNumber(value, 1);
}

/** A round length (1, 2 or 5 × 10ⁿ mm) not longer than `atMost`. */
function niceScaleBar(atMost: number): number {
  const power = 10 ** Math.floor(Math.log10(atMost));
  for (const step of [5, 2, 1]) {
    if (step * power <= atMost) return step * power;
  }
  return power;
}
