/** "Hold stock for the build": the builder reserves what the order still needs, all or what is there. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import type { Shortage } from "~/build-orders/build-order-errors";
import { FormMessages } from "~/components/text-field";
import { ShortagesTable } from "./shortages-table";

export function ReservePanel({
  order,
  primary,
  lastResult,
  shortages,
}: {
  order: BuildOrderDetails;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
  shortages?: Shortage[];
}) {
  const navigation = useNavigation();
  const [form] = useForm({
    id: "reserve",
    lastResult: navigation.state === "idle" ? lastResult : null,
  });
  const toReserve = order.lines.filter((line) => line.toReserve > 0);
  return (
    <section aria-labelledby="reserve-heading" className="panel space-y-3">
      <h2 id="reserve-heading" className="text-lg font-semibold">
        Hold stock for the build
      </h2>
      <p className="text-sm text-graphite-700">
        {toReserve.length} {toReserve.length === 1 ? "item" : "items"} still to
        hold, taken from the oldest lots first. Either every item is held in
        full, or nothing is.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-3">
        <input type="hidden" name="intent" value="reserve" />
        <FormMessages id={form.errorId} errors={form.errors} />
        {shortages && shortages.length > 0 ? (
          <ShortagesTable shortages={shortages} />
        ) : null}
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            name="partial"
            className="mt-0.5 h-4 w-4 accent-copper-600"
          />
          <span>
            Reserve what is there
            <span className="block text-xs text-graphite-500">
              Hold what is free now and leave the rest short.
            </span>
          </span>
        </label>
        <button
          type="submit"
          className={primary ? "button-primary w-full" : "button-quiet w-full"}
          disabled={navigation.state !== "idle"}
        >
          Reserve stock
        </button>
      </Form>
    </section>
  );
}
