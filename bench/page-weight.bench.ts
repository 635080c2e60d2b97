/**
 * The "pages" group: each page's first-load JavaScript, gzipped, from the
 * production build's route manifest (scripts/lib/page-weight.ts), against the
 * budget of 150 KB. A size, not a time: the same on every run of one build.
 */
import path from "node:path";
import {
  firstLoadBudgetKb,
  kilobytes,
  pageWeights,
} from "../scripts/lib/page-weight";
import type { Figure } from "./coil-estimates.bench";

/** One figure per page, heaviest first, from the build in `buildDirectory`. */
export function benchPageWeight(buildDirectory: string): Figure[] {
  return pageWeights(path.join(buildDirectory, "client")).map((page) => {
    const kb = kilobytes(page.gzipBytes);
    return {
      name: `first-load JavaScript (gzip) ${page.path}`,
      unit: "KB gzip",
      target: `< ${firstLoadBudgetKb} KB`,
      passed: kb < firstLoadBudgetKb,
      median: kb,
      p95: kb,
      samples: [kb],
    };
  });
}
