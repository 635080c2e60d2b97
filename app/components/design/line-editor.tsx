import { formatNumberForField } from "~/lib/format";
import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { useEffect } from "react";
import { useFetcher } from "react-router";
import type { DesignPageLine } from "~/designs/design-page.server";
import {
  coilLineSchema,
  magnetLineSchema,
  partLineSchema,
} from "~/designs/design-schemas";
import { formNumber } from "~/lib/number-text";
import type { DesignActionAnswer } from "./action-answer";
import { CoilDrawing } from "~/components/estimators/coil-drawing";
import { DesignItemPicker } from "./item-picker";
import { lineItemTexts } from "./line-item-texts";
import { LineQuantityFields } from "./line-quantity-fields";
import { EndTurnHelper } from "~/components/estimators/end-turn-helper";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages } from "~/components/text-field";

export type LineKind = "coil" | "magnet" | "part";

const schemas = {
  coil: coilLineSchema,
  magnet: magnetLineSchema,
  part: partLineSchema,
} as const;

const kindNames: Record<LineKind, string> = {
  coil: "coil line",
  magnet: "magnet line",
  part: "part line",
};

/** A typed number as the drawing takes it ("1,25" too); NaN (no drawing) for anything else. */
function typedNumber(value: unknown): number {
  const read = formNumber(value);
  return typeof read === "number" ? read : Number.NaN;
}

/** What the fields start with: the line's values, or a new line's few sensible defaults. */
function startingValues(kind: LineKind, line: DesignPageLine | null) {
  const values: Record<string, string> = { kind };
  if (line) {
    for (const [name, value] of Object.entries(line.input))
      if (value !== null && value !== undefined)
        values[name] =
          typeof value === "number"
            ? formatNumberForField(value)
            : String(value);
    return values;
  }
  if (kind === "coil") {
    values.strandsInHand = "1";
    // Common practice (engineering brief): 2–5 % in production.
    values.scrapPercent = "3";
  }
  return values;
}

/**
 * Adds or changes one line of a draft revision. Each save goes to the page's
 * action through a fetcher: the page's figures update without a reload, and
 * the fields stay as typed. A new line, once added, stays open for changes.
 */
export function DesignLineEditor({
  formId,
  kind,
  line,
  figures,
  onAdded,
  onClose,
}: {
  /** Stable for one editing session, so the typed values survive each save. */
  formId: string;
  kind: LineKind;
  /** The line as stored now (its id changes with every save of the list); null for a new line. */
  line: DesignPageLine | null;
  /** The line's figures as last saved, shown beside the fields. */
  figures?: React.ReactNode;
  onAdded: (position: number) => void;
  onClose: () => void;
}) {
  const fetcher = useFetcher<DesignActionAnswer>();
  const schema = schemas[kind];
  const [form, fields] = useForm({
    id: formId,
    lastResult: fetcher.data?.result,
    defaultValue: startingValues(kind, line),
    constraint: getZodConstraint(schema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseForm(formData, { schema }),
  });
  const busy = fetcher.state !== "idle";
  const answer = fetcher.state === "idle" ? fetcher.data : undefined;

  // A new line, once added, is edited in place from then on.
  useEffect(() => {
    if (line === null && answer?.ok && answer.position)
      onAdded(answer.position);
  }, [answer, line, onAdded]);

  const title = line
    ? `Change ${kindNames[kind]} ${line.position}`
    : `New ${kindNames[kind]}`;
  const headingId = `${formId}-heading`;
  // Conform types each field by the union of the three schemas; the inputs only need name, id and errors.
  const field = fields as unknown as Record<
    string,
    Parameters<typeof QuantityField>[0]["field"]
  >;
  const skuField = fields.sku as unknown as Parameters<
    typeof DesignItemPicker
  >[0]["field"];

  return (
    <section
      aria-labelledby={headingId}
      className="panel border-copper-300 bg-copper-50/40"
    >
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-3">
        <h3 id={headingId} className="text-base font-semibold">
          {title}
        </h3>
        <button type="button" className="button-quiet" onClick={onClose}>
          Close
        </button>
      </div>
      <div className="grid gap-5 xl:grid-cols-[1fr_18rem]">
        <fetcher.Form
          method="post"
          {...getFormProps(form)}
          aria-labelledby={headingId}
          className="space-y-4"
        >
          <input type="hidden" name="intent" value="save-line" />
          <input type="hidden" name="kind" value={kind} />
          {line ? <input type="hidden" name="lineId" value={line.id} /> : null}
          <FormMessages id={form.errorId} errors={form.errors} />
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            <div className="sm:col-span-2">
              <DesignItemPicker
                field={skuField}
                label={lineItemTexts[kind].label}
                kind={lineItemTexts[kind].itemKind}
                hint={lineItemTexts[kind].hint}
                knownItem={
                  line
                    ? { sku: line.input.sku, name: line.itemName }
                    : undefined
                }
              />
            </div>
            <LineQuantityFields kind={kind} field={field} />
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <button type="submit" className="button-primary" disabled={busy}>
              {busy ? "Saving…" : line ? "Save line" : "Add line"}
            </button>
          </div>
        </fetcher.Form>
        {figures || kind === "coil" ? (
          <div className="space-y-3 text-sm">
            {figures ? <div aria-live="polite">{figures}</div> : null}
            {kind === "coil" ? (
              <div className="rounded-md border border-rule bg-white/70 p-3">
                <p className="text-xs font-semibold uppercase tracking-wide text-graphite-500">
                  One coil to scale, as typed
                </p>
                <CoilDrawing
                  activeLengthMm={typedNumber(field.activeLengthMm!.value)}
                  endTurnLengthMm={typedNumber(field.endTurnLengthMm!.value)}
                />
              </div>
            ) : null}
          </div>
        ) : null}
      </div>
      {kind === "coil" ? (
        <div className="mt-4">
          <EndTurnHelper
            onUse={(lengthMm) => {
              form.update({
                name: field.endTurnLengthMm!.name,
                value: String(lengthMm),
              });
            }}
          />
        </div>
      ) : null}
    </section>
  );
}
