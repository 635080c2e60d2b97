/**
 * What the design pages read and change, with no framework and no database:
 * the costing query of the page (build quantity and price basis), the page
 * action's intents, and how one line's change becomes the revision's whole
 * list of lines (the data layer replaces the list at once). Pure.
 */
import { formatNumber } from "~/lib/format";
import { z } from "zod";
import type { DesignLineInput } from "./design-schemas";

import { costBasisLabels, type CostBasis } from "./cost-basis";

export {
  costBasisLabels,
  costQuerySearch,
  type CostBasis,
} from "./cost-basis";

export const maxBuildQuantity = 1_000_000;

const blankToUndefined = (value: unknown) =>
  typeof value === "string" && value.trim() === "" ? undefined : value;

/** The page's cost form (GET): motors in the build and the price basis. */
export const costQuerySchema = z.object({
  quantity: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: "Give the number of motors as a whole number." })
      .int("Give the number of motors as a whole number.")
      .min(1, "A build is at least 1 motor.")
      .max(maxBuildQuantity, {
        error: () =>
          `A build is at most ${formatNumber(maxBuildQuantity)} motors.`,
      })
      .default(1),
  ),
  basis: z.preprocess(
    blankToUndefined,
    z
      .enum(Object.keys(costBasisLabels) as [CostBasis, ...CostBasis[]], {
        error: "Choose the best supplier price or the average cost of stock.",
      })
      .default("best-price"),
  ),
});

export interface CostQuery {
  quantity: number;
  basis: CostBasis;
  /** What the person typed, to show back in the form. */
  typed: { quantity: string; basis: string };
  /** A message per field the page could not use (the default is used instead). */
  errors: { quantity?: string; basis?: string };
}

/** Reads ?quantity=&basis= of a design page; a bad value falls back to its default, with its message. */
export function readCostQuery(search: URLSearchParams): CostQuery {
  const typed = {
    quantity: search.get("quantity") ?? "",
    basis: search.get("basis") ?? "",
  };
  const errors: CostQuery["errors"] = {};
  const quantity = costQuerySchema.shape.quantity.safeParse(typed.quantity);
  if (!quantity.success) errors.quantity = quantity.error.issues[0]?.message;
  const basis = costQuerySchema.shape.basis.safeParse(typed.basis);
  if (!basis.success) errors.basis = basis.error.issues[0]?.message;
  return {
    quantity: quantity.success ? quantity.data : 1,
    basis: basis.success ? basis.data : "best-price",
    typed,
    errors,
  };
}

/** What the design page's action does, named by the form's `intent` field. */
export const designPageIntents = [
  "fields",
  "save-line",
  "remove-line",
  "release",
  "new-revision",
  "use-substitute",
] as const;
export type DesignPageIntent = (typeof designPageIntents)[number];

export function designPageIntentOf(value: unknown): DesignPageIntent | null {
  return (designPageIntents as readonly unknown[]).includes(value)
    ? (value as DesignPageIntent)
    : null;
}

/** A stored line: its id (new on every save of the list) and the fields the line schemas take. */
export interface StoredLineInput {
  id: number;
  input: DesignLineInput;
}

/** One change of the page to a revision's lines. */
export type LineChange =
  /** lineId null: a new line at the end; else the line with that id, in its place. */
  | { kind: "save"; lineId: number | null; line: DesignLineInput }
  | { kind: "remove"; lineId: number };

/**
 * The revision's whole list of lines after one change, and the index of the line changed
 * (for a save; -1 for a removal). Null when the line to change is no longer there: the
 * list was saved meanwhile (every save gives the lines new ids), so the change is refused
 * rather than made to the wrong line.
 */
export function applyLineChange(
  stored: readonly StoredLineInput[],
  change: LineChange,
): { lines: DesignLineInput[]; index: number } | null {
  const lines = stored.map((line) => line.input);
  if (change.kind === "save" && change.lineId === null) {
    return { lines: [...lines, change.line], index: lines.length };
  }
  const index = stored.findIndex((line) => line.id === change.lineId);
  if (index < 0) return null;
  if (change.kind === "remove") {
    return { lines: lines.filter((_, at) => at !== index), index: -1 };
  }
  return {
    lines: lines.map((line, at) => (at === index ? change.line : line)),
    index,
  };
}

/**
 * The index of the line a data-layer message is about: its field is "lines[3].sku" (and
 * its message says "Line 4: …"); null when the message is not about one line.
 */
export function lineIndexOfField(field: string | undefined): number | null {
  const match = /^lines\[(\d+)\]/.exec(field ?? "");
  return match ? Number(match[1]) : null;
}

/** The line id a form posts: null when none (a new line), "bad" when it is not a positive whole number. */
export function formLineId(
  value: FormDataEntryValue | null,
): number | null | "bad" {
  if (value === null || value === "") return null;
  const id = Number(value);
  return Number.isSafeInteger(id) && id > 0 ? id : "bad";
}
