import { formatNumberForField } from "~/lib/format";
/**
 * One line of the blind count sheet: item, lot, unit and a field for what was found (for
 * wire also the spool's gross weight and tare). Enter saves the line without leaving the
 * page and moves the cursor to the next line's first field.
 */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { useEffect, useRef } from "react";
import { useFetcher } from "react-router";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages } from "~/components/text-field";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import type { CountSheetLine } from "~/stocktakes/count-sheet";
import type { CountInput } from "~/stocktakes/stocktake-forms";

export interface CountAnswer {
  intent: "count" | "add";
  lineId?: number;
  saved?: boolean;
  result: SubmissionResult<string[]>;
}

/** The first field of a line's form (its form's id is `count-<line id>`). */
function firstFieldOf(lineId: number): HTMLInputElement | null {
  const form = document.getElementById(`count-${lineId}`);
  const input = form?.querySelector('input[name="quantity"]');
  return input instanceof HTMLInputElement ? input : null;
}

function countedText(line: CountSheetLine): string {
  if (line.recountRequested)
    return "Count again: the reviewer asked for a recount.";
  if (line.counted === null) return "Not counted yet.";
  const amount = formatStockQuantity(line.counted, line.unit);
  return line.weighed
    ? `Counted ${amount} (weighed ${formatStockQuantity(line.weighed.grossKg, "kg")} − tare ${formatStockQuantity(line.weighed.tareKg, "kg")}).`
    : `Counted ${amount}.`;
}

export function CountLineForm({
  line,
  nextId,
  disabled,
}: {
  line: CountSheetLine;
  nextId: number | null;
  disabled: boolean;
}) {
  const fetcher = useFetcher<CountAnswer>({ key: `count-${line.id}` });
  const answer = fetcher.data?.lineId === line.id ? fetcher.data : undefined;
  const validate = useBrowserValidation(() =>
    import("~/stocktakes/stocktake-forms").then(
      (module) => module.countFormSchema,
    ),
  );
  const [form, fields] = useForm<
    {
      intent: string;
      lineId: string;
      quantity: string;
      grossKg: string;
      tareKg: string;
    },
    CountInput
  >({
    id: `count-${line.id}`,
    defaultValue: {
      tareKg:
        line.lotTareKg === null
          ? undefined
          : formatNumberForField(line.lotTareKg),
    },
    lastResult: fetcher.state === "idle" ? answer?.result : null,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  const moved = useRef<unknown>(null);
  useEffect(() => {
    // Once a save comes back, on to the next line (once per answer).
    if (fetcher.state !== "idle" || !answer?.saved || moved.current === answer)
      return;
    moved.current = answer;
    const next = nextId === null ? null : firstFieldOf(nextId);
    if (next) {
      next.focus();
      next.select();
    }
  }, [fetcher.state, answer, nextId]);
  const headingId = `count-${line.id}-heading`;
  const statusClass = line.recountRequested
    ? "text-caution"
    : line.counted === null
      ? "text-graphite-500"
      : "text-ok";
  return (
    <li
      aria-labelledby={headingId}
      className="rounded-lg border border-rule bg-sheet p-3 shadow-xs"
    >
      <h3 id={headingId} className="font-semibold">
        {line.sku}{" "}
        <span className="font-normal text-graphite-700">{line.name}</span>
      </h3>
      <p className="text-sm text-graphite-700">
        {line.lot ? (
          <>
            Lot <span className="font-medium">{line.lot}</span> ·{" "}
          </>
        ) : null}
        counted in {line.unit}
        {line.addedDuringCount ? " · added on the floor" : ""}
      </p>
      <p role="status" className={`mt-1 text-sm ${statusClass}`}>
        {fetcher.state !== "idle" ? "Saving…" : countedText(line)}
      </p>
      <fetcher.Form
        method="post"
        {...getFormProps(form)}
        aria-labelledby={headingId}
        className="mt-2 space-y-2"
      >
        <input type="hidden" name="intent" value="count" />
        <input type="hidden" name="lineId" value={line.id} />
        <FormMessages id={form.errorId} errors={form.errors} />
        <div className={line.weighable ? "grid grid-cols-3 gap-2" : undefined}>
          <QuantityField
            field={fields.quantity}
            label={line.weighable ? "Net" : "Quantity found"}
            unit={line.unit}
          />
          {line.weighable ? (
            <>
              <QuantityField
                field={fields.grossKg}
                label="or gross"
                unit="kg"
              />
              <QuantityField field={fields.tareKg} label="tare" unit="kg" />
            </>
          ) : null}
        </div>
        <button
          type="submit"
          className="button-primary w-full"
          disabled={disabled || fetcher.state !== "idle"}
        >
          Save {line.sku}
          {line.lot ? ` lot ${line.lot}` : ""}
        </button>
      </fetcher.Form>
    </li>
  );
}
