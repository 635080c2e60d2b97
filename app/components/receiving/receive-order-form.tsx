/**
 * The delivery against one order: each open line with its spools or lots (one to start
 * with, more added per line), validated in the browser with the schema the server uses (loaded after hydration).
 * Field errors show at their entry; what was typed stays after a refusal.
 */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useRef, useState } from "react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { ScanPanel } from "~/components/labels/scan-panel";
import { Form, useNavigation } from "react-router";
import { FormMessages } from "~/components/text-field";
import type { ReceivingOrder } from "~/purchase-orders/receiving-view";
import { OrderLineSummary } from "./order-line-summary";
import { fillReceiveFormFromScan } from "./receive-scan";
import { SpoolEntryFields } from "./spool-entry-fields";

interface Entry {
  key: number;
  lineId: number;
}

export function ReceiveOrderForm({
  order,
  locations,
  lastResult,
}: {
  order: ReceivingOrder;
  locations: { code: string; name: string }[];
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const lines = order.lines.filter((line) => line.mayStillTake > 0);
  const [entries, setEntries] = useState<Entry[]>(() =>
    lines.map((line, key) => ({ key, lineId: line.id })),
  );
  const [nextKey, setNextKey] = useState(lines.length);
  const formElement = useRef<HTMLFormElement>(null);
  /** The entry last worked on (by its position): where a scanned location goes. */
  const [lastWorkedOn, setLastWorkedOn] = useState<number | null>(null);
  const validate = useBrowserValidation(
    () =>
      import("~/purchase-orders/receipt-request").then(
        (module) => module.receiptFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const [form] = useForm({
    id: `receive-${order.id}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate: validate,
  });
  const errors = (form.allErrors ?? {}) as Record<string, string[] | undefined>;
  const add = (lineId: number) => {
    setEntries((current) => [...current, { key: nextKey, lineId }]);
    setNextKey((key) => key + 1);
  };
  const remove = (key: number) => {
    setEntries((current) => current.filter((entry) => entry.key !== key));
    setLastWorkedOn(null);
  };
  const lineOf = new Map(lines.map((line) => [line.id, line]));
  const scanTargets = () =>
    entries.map((entry, index) => {
      const line = lineOf.get(entry.lineId)!;
      const position = entries
        .slice(0, index + 1)
        .filter((each) => each.lineId === entry.lineId).length;
      return {
        index,
        sku: line.sku,
        name: `${line.isWire ? "spool" : "lot"} ${position} of line ${line.lineNumber}`,
      };
    });

  if (lines.length === 0)
    return (
      <p className="panel">Every line of {order.number} is received in full.</p>
    );
  return (
    <>
      <ScanPanel
        hint="Scan a bin label to fill the location of the spool or lot you are on (every one when none yet), or an existing lot's label to fill its lot number. Or type the code under the QR code, then Enter."
        onFound={(answer) =>
          formElement.current
            ? fillReceiveFormFromScan(
                formElement.current,
                scanTargets(),
                lastWorkedOn,
                answer,
                order.number,
              )
            : {
                filled: false,
                text: "The form is not ready yet. Nothing was filled.",
              }
        }
      />
      <Form
        method="post"
        ref={formElement}
        {...getFormProps(form)}
        className="space-y-5"
        onFocus={(event) => {
          const name = (event.target as { name?: string }).name ?? "";
          const index = /^lines\[(\d+)\]/.exec(name)?.[1];
          if (index !== undefined) setLastWorkedOn(Number(index));
        }}
      >
        <FormMessages id={form.errorId} errors={form.errors ?? errors.lines} />
        <input type="hidden" name="orderId" value={order.id} />
        {lines.map((line) => (
          <section
            key={line.id}
            className="panel space-y-3"
            aria-label={`Line ${line.lineNumber}, ${line.sku}`}
          >
            <OrderLineSummary line={line} currency={order.companyCurrency} />
            {entries.map((entry, index) =>
              entry.lineId === line.id ? (
                <SpoolEntryFields
                  key={entry.key}
                  index={index}
                  number={
                    entries
                      .slice(0, index + 1)
                      .filter((each) => each.lineId === line.id).length
                  }
                  lineId={line.id}
                  unit={line.unit}
                  isWire={line.isWire}
                  locations={locations}
                  usualLocation={line.usualLocation}
                  errors={errors}
                  onRemove={() => remove(entry.key)}
                />
              ) : null,
            )}
            <button
              type="button"
              className="button-quiet"
              onClick={() => add(line.id)}
            >
              Add a {line.isWire ? "spool" : "lot"} to line {line.lineNumber}
            </button>
          </section>
        ))}
        <button
          type="submit"
          className="button-primary min-h-12 w-full text-lg"
          disabled={busy || entries.length === 0}
        >
          {busy ? "Receiving…" : `Receive against ${order.number}`}
        </button>
      </Form>
    </>
  );
}
