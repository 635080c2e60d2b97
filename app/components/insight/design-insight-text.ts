/**
 * The texts and addresses of the design half of the cost insight, worked out from the
 * loader's data alone (no React): a design's label, the what-if as a sentence, the
 * address of another page of designs with the what-if kept, and a change with its sign.
 */
import type { InsightLoaderData } from "~/insight/insight-page.server";
import type { DesignInsight } from "~/insight/design-insight.server";
import { costingMoneyText, moneyFromJson } from "~/insight/design-insight";
import { formatQuantity } from "~/lib/format";

/** The id of the what-if form, which the end-turn inputs in the table belong to. */
export const whatIfFormId = "insight-what-if";

/** What the design half of the insight reads of the loader's data. */
export type InsightDesignsData = Pick<
  InsightLoaderData,
  | "designs"
  | "bases"
  | "fields"
  | "errors"
  | "whatIf"
  | "quantity"
  | "basis"
  | "today"
>;

/** "Name · rev 3". */
export function designLabel(
  design: Pick<DesignInsight, "name" | "revision">,
): string {
  return `${design.name} · rev ${design.revision}`;
}

/** The ranked designs as the rows of the cost chart, in the ranking's order. */
export function costChartRows(
  ranked: readonly Pick<
    DesignInsight,
    | "designId"
    | "name"
    | "revision"
    | "costPerNm"
    | "splitPerNm"
    | "complete"
    | "perNmTorque"
  >[],
) {
  return ranked.map((design) => ({
    key: String(design.designId),
    label: designLabel(design),
    costPerNm: design.costPerNm,
    splitPerNm: design.splitPerNm,
    complete: design.complete,
    estimated: design.perNmTorque?.source === "estimated",
  }));
}

/** The what-if as a sentence, or null when the figures are the stored ones. */
export function whatIfSentence(data: {
  bases: {
    currency: string;
    copper: { pricePerKg: number } | null;
    aluminium: { pricePerKg: number } | null;
  };
  whatIf: { copperBase: number | null; aluminiumBase: number | null };
  designs: { designs: readonly { name: string; endTurnScale: number }[] };
}): string | null {
  const currency = data.bases.currency;
  const parts: string[] = [];
  for (const metal of ["copper", "aluminium"] as const) {
    const value =
      metal === "copper" ? data.whatIf.copperBase : data.whatIf.aluminiumBase;
    if (value === null) continue;
    const stored = data.bases[metal];
    parts.push(
      `${metal} base ${costingMoneyText(value, currency, "kg")}${stored ? ` instead of the stored ${costingMoneyText(stored.pricePerKg, currency, "kg")}` : ""}`,
    );
  }
  for (const design of data.designs.designs)
    if (design.endTurnScale !== 1)
      parts.push(
        `end turns × ${formatQuantity(design.endTurnScale, "", 2)} on ${design.name}`,
      );
  return parts.length === 0 ? null : parts.join("; ");
}

/** The address of another page of the designs table, keeping the what-if's fields. */
export function designsPageHref(
  fields: InsightDesignsData["fields"],
  page: number,
): string {
  const params = new URLSearchParams();
  if (fields.quantity) params.set("quantity", fields.quantity);
  if (fields.copperBase) params.set("copperBase", fields.copperBase);
  if (fields.aluminiumBase) params.set("aluminiumBase", fields.aluminiumBase);
  if (fields.date) params.set("date", fields.date);
  if (fields.basis) params.set("basis", fields.basis);
  for (const [id, value] of Object.entries(fields.endTurn))
    if (value) params.set(`endTurn.${id}`, value);
  params.set("page", String(page));
  return `?${params.toString()}`;
}

/** A change with its sign, in the unit of the figure above it: "+0.06", "−0.10", "±0.00". */
export function signedChangeText(change: number): string {
  const value = moneyFromJson(change);
  const text = costingMoneyText(Number(value < 0n ? -value : value) / 10_000);
  return `${value > 0n ? "+" : value < 0n ? "−" : "±"}${text}`;
}
