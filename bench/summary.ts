/**
 * bench/summary.txt from a run's figures: first every goal of the current issue with
 * its figure and "met", "MISSED" or "not measured" (a group not run), then the two
 * store sizes side by side, then every figure with its raw baseline. Pure: no I/O.
 *
 * A goal that is a ratio names the app figure and its raw baseline by the start of
 * their names (`ratioGoals`); a goal on one figure names it the same way and its
 * limit (`figureGoals`); the size goals come from the "size ratio" figures of the
 * scale group. A group adding a figure that a goal reads adds or adjusts a line here.
 */
import type { Figure } from "./coil-estimates.bench";

/** The scale group's ratio figures start with this ("size ratio 10 M ÷ 1 M: <figure>"). */
export const sizeRatioPrefix = "size ratio";

/**
 * Which raw baseline each app figure wraps (the bare SQL or mysql2 handler of the same
 * work, timed in the same run), by the start of the figures' names; `max` is the goal
 * when there is one. Throughput is compared the other way round (raw ÷ app), so that
 * for every ratio higher means the app costs more.
 */
export const ratioGoals: {
  goal?: string;
  figure: string;
  raw: string;
  throughput?: boolean;
  max?: number;
}[] = [
  {
    goal: "design costing API under load, raw ÷ app (req/s)",
    figure: "design costing API under load: requests per second (app)",
    raw: "design costing API under load: requests per second (raw mysql2)",
    throughput: true,
    max: 4,
  },
  {
    goal: "stock list API under load, raw ÷ app (req/s)",
    figure: "stock list API under load: requests per second (app)",
    raw: "stock list API under load: requests per second (raw mysql2)",
    throughput: true,
    max: 2,
  },
  {
    goal: "recording a movement, app p95 ÷ raw transaction p95",
    figure: "POST /api/v1/stock-movements",
    raw: "raw SQL of one movement",
    max: 3,
  },
  {
    goal: "100,000-row price-list commit ÷ raw batched upsert",
    figure: "price list 100,000 rows: commit",
    raw: "raw batched upsert of the same rows",
    max: 2,
  },
  { figure: "GET /stock.data", raw: "raw SQL of the list" },
  { figure: "GET /api/v1/items", raw: "raw SQL of the list" },
];

/** Goals on figures themselves: every figure whose name starts so must reach the limit. */
export const figureGoals: {
  goal: string;
  figure: string;
  atLeast?: number;
  below?: number;
  unit: string;
}[] = [
  {
    goal: "server memory growth during the price-list commit",
    figure: "server peak memory growth during import",
    below: 200,
    unit: "MB",
  },
  {
    goal: "Lighthouse mobile performance, every measured page",
    figure: "Lighthouse mobile performance",
    atLeast: 90,
    unit: "",
  },
  {
    goal: "first-load JavaScript (gzip), every page",
    figure: "first-load JavaScript",
    below: 150,
    unit: "KB",
  },
];

/** The size goals: every figure the scale group holds to them. */
const sizeGoalLabels = [
  "stock list loader",
  "stock list API",
  "item page loader",
  "item page document",
  "item API",
  "record a movement",
  "journal of the busy item, first page",
  "journal of the busy item, deep page (its Older link)",
];

export interface Comparison {
  raw: string;
  rawMedian: number;
  rawP95: number;
  ratioMedian: number;
  ratioP95: number;
  max?: number;
}

export function comparisonOf(
  figure: Figure,
  figures: Figure[],
): Comparison | null {
  const pairing = ratioGoals.find((entry) =>
    figure.name.startsWith(entry.figure),
  );
  const raw =
    pairing && figures.find((entry) => entry.name.startsWith(pairing.raw));
  if (!pairing || !raw) return null;
  const ratio = (app: number, bare: number) =>
    pairing.throughput ? bare / app : app / bare;
  return {
    raw: raw.name,
    rawMedian: raw.median,
    rawP95: raw.p95,
    ratioMedian: ratio(figure.median, raw.median),
    ratioP95: ratio(figure.p95, raw.p95),
    max: pairing.max,
  };
}

const number = (value: number) =>
  Math.abs(value) >= 1000 ? value.toFixed(0) : value.toFixed(2);
const times = (value: number) => `${value.toFixed(2)}×`;
const verdictOf = (passed: boolean) => (passed ? "met" : "MISSED");

/** A row: the name in its column, or on a line of its own when it is longer. */
function row(name: string, nameWidth: number, rest: string): string[] {
  if (name.length <= nameWidth) return [`${name.padEnd(nameWidth)}${rest}`];
  return [name, `${"".padEnd(nameWidth)}${rest}`];
}

export interface GoalLine {
  goal: string;
  value: string;
  limit: string;
  result: "met" | "MISSED" | "not measured";
}

/** Every goal with its figure and result. */
export function goalLines(figures: Figure[]): GoalLine[] {
  const lines: GoalLine[] = [];
  for (const entry of ratioGoals) {
    if (!entry.goal || entry.max === undefined) continue;
    const app = figures.find((figure) => figure.name.startsWith(entry.figure));
    const comparison = app && comparisonOf(app, figures);
    lines.push({
      goal: entry.goal,
      value: comparison ? times(comparison.ratioP95) : "—",
      limit: `≤ ${entry.max}×`,
      result: comparison
        ? verdictOf(comparison.ratioP95 <= entry.max)
        : "not measured",
    });
  }
  for (const label of sizeGoalLabels) {
    const ratio = figures.find(
      (figure) =>
        figure.name.startsWith(sizeRatioPrefix) &&
        figure.name.includes(`: ${label}`),
    );
    lines.push({
      goal: `p95 at 10 M movements ÷ at 1 M: ${label}`,
      value: ratio ? times(ratio.p95) : "—",
      limit: ratio ? ratio.target : "≤ 1.5×",
      result: ratio ? verdictOf(ratio.passed) : "not measured",
    });
  }
  for (const entry of figureGoals) {
    const measured = figures.filter((figure) =>
      figure.name.startsWith(entry.figure),
    );
    const reaches = (figure: Figure) =>
      entry.atLeast !== undefined
        ? figure.median >= entry.atLeast
        : figure.median < entry.below!;
    const worst = measured.reduce<Figure | undefined>(
      (found, figure) =>
        !found ||
        (entry.atLeast !== undefined
          ? figure.median < found.median
          : figure.median > found.median)
          ? figure
          : found,
      undefined,
    );
    lines.push({
      goal:
        measured.length > 1
          ? `${entry.goal} (worst of ${measured.length})`
          : entry.goal,
      value: worst ? `${number(worst.median)} ${entry.unit}`.trim() : "—",
      limit:
        entry.atLeast !== undefined
          ? `≥ ${entry.atLeast} ${entry.unit}`.trim()
          : `< ${entry.below} ${entry.unit}`.trim(),
      result: worst ? verdictOf(measured.every(reaches)) : "not measured",
    });
  }
  return lines;
}

export function formatSummary(report: {
  at: string;
  machine: { node: string; cpus: number };
  figures: Figure[];
  notes?: string[];
}): string[] {
  const { figures } = report;
  const goals = goalLines(figures);
  const met = goals.filter((line) => line.result === "met").length;
  const missed = goals.filter((line) => line.result === "MISSED").length;
  const lines = [
    `Turnledger benchmarks, ${report.at}: Node ${report.machine.node}, ${report.machine.cpus} cores.`,
    "",
    `Goals: ${met} met, ${missed} missed, ${goals.length - met - missed} not measured in this run.`,
    "",
    `${"goal".padEnd(70)}${"figure".padStart(11)}${"goal".padStart(10)}   result`,
    ...goals.flatMap((line) =>
      row(
        line.goal,
        70,
        `${line.value.padStart(11)}${line.limit.padStart(10)}   ${line.result}`,
      ),
    ),
  ];

  // The two sizes side by side.
  const sizeRatios = figures.filter((figure) =>
    figure.name.startsWith(sizeRatioPrefix),
  );
  if (sizeRatios.length > 0) {
    const sizes = /^size ratio (.+?) ÷ (.+?): /.exec(sizeRatios[0]!.name)!;
    const [, large, normal] = sizes as unknown as [string, string, string];
    lines.push(
      "",
      `Cost as the work grows: p95 in ms at ${normal} and ${large} movements (medians in report.json)`,
      `${"figure".padEnd(60)}${normal.padStart(10)}${large.padStart(10)}${"ratio".padStart(9)}${"goal".padStart(9)}   result`,
    );
    for (const ratio of sizeRatios) {
      const label = ratio.name.slice(ratio.name.indexOf(": ") + 2);
      const at = (size: string) =>
        figures.find((figure) => figure.name === `${label} @ ${size}`);
      lines.push(
        ...row(
          label,
          60,
          `${number(at(normal)?.p95 ?? NaN).padStart(10)}${number(at(large)?.p95 ?? NaN).padStart(10)}${times(ratio.p95).padStart(9)}${ratio.target.replace("reported", "—").padStart(9)}   ${ratio.target === "reported" ? "" : verdictOf(ratio.passed)}`,
        ),
      );
    }
  }

  lines.push(
    "",
    "Every figure: median and p95 in its unit; raw p95 is the bare SQL or mysql2 handler of the same",
    "work in the same run, the ratio app ÷ raw (raw ÷ app for requests per second: higher, app adds more).",
    `${"figure".padEnd(52)}${"median".padStart(10)}${"p95".padStart(10)}${"raw p95".padStart(10)}${"ratio".padStart(8)}   target, result`,
  );
  for (const figure of figures) {
    if (figure.name.startsWith(sizeRatioPrefix)) continue;
    const comparison = comparisonOf(figure, figures);
    const target =
      figure.target === "reported"
        ? ""
        : `${figure.target}, ${verdictOf(figure.passed)}`;
    lines.push(
      ...row(
        `${figure.name} (${figure.unit})`,
        52,
        `${number(figure.median).padStart(10)}${number(figure.p95).padStart(10)}${(comparison ? number(comparison.rawP95) : "").padStart(10)}${(comparison ? times(comparison.ratioP95) : "").padStart(8)}   ${target}`,
      ),
    );
  }
  lines.push("", ...(report.notes ?? []), "Raw samples in bench/report.json.");
  return lines.map((line) => line.trimEnd());
}
