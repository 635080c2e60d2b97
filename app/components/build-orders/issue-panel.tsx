/**
 * "Issue to the bench": the storekeeper issues held stock to the order, by quantity or,
 * for a wire spool with a tare, by weighing the spool back.
 */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { useState } from "react";
import { Form, useNavigation } from "react-router";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { heldSpots, weighBackPreview } from "~/build-orders/build-order-view";
import { MeasureField } from "~/components/measure-field";
import { FormMessages } from "~/components/text-field";
import { formatQuantity } from "~/lib/format";
import { HeldSpotChoice } from "./held-spot-choice";
import { WeighBackNote } from "./weigh-back-note";

export function IssuePanel({
  order,
  primary,
  lastResult,
}: {
  order: BuildOrderDetails;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(
    () =>
      import("~/build-orders/build-order-forms").then(
        (module) => module.intentSchemas.issue,
      ),
    { disableAutoCoercion: true },
  );
  const busy = navigation.state !== "idle";
  const spots = heldSpots(order.lines);
  const [form] = useForm({
    id: `issue-${order.id}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate: validate,
  });
  const errors = (form.allErrors ?? {}) as Record<string, string[] | undefined>;
  // The oldest lot of the first item still held is suggested.
  const [spotKey, setSpotKey] = useState(spots[0]?.key ?? "");
  const [gross, setGross] = useState("");
  const chosen = spots.find((spot) => spot.key === spotKey);
  const weighable = chosen?.kind === "wire" && chosen.tareKg !== null;
  const weighBack = weighBackPreview(chosen, gross);
  const issueKg = weighBack?.issueKg ?? null;

  return (
    <section aria-labelledby="issue-heading" className="panel space-y-3">
      <h2 id="issue-heading" className="text-lg font-semibold">
        Issue to the bench
      </h2>
      {spots.length === 0 ? (
        <p className="text-sm text-graphite-700">
          Nothing is held for {order.reference} now. A builder reserves stock
          before it is issued.
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <input type="hidden" name="intent" value="issue" />
          <FormMessages id={form.errorId} errors={form.errors} />
          <HeldSpotChoice
            spots={spots}
            chosenKey={spotKey}
            onChoose={(key) => {
              setSpotKey(key);
              setGross("");
            }}
            errors={errors.spot}
          />

          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-1">
            {weighable ? (
              <IssueField
                name="grossKg"
                label="Spool gross weight now"
                unit="kg"
                value={gross}
                onChange={(event) => setGross(event.target.value)}
                errors={errors.grossKg}
                hint="Weigh the spool back, or leave empty and type the quantity."
              />
            ) : null}
            {weighBack === null ? (
              <IssueField
                key={spotKey}
                name="quantity"
                label="Quantity"
                unit={chosen?.unit}
                defaultValue={chosen ? String(chosen.quantity) : ""}
                errors={errors.quantity}
              />
            ) : null}
            <IssueField
              name="note"
              label="Note (optional)"
              errors={errors.note}
              inputMode="text"
            />
          </div>

          {weighBack?.netNowKg != null && chosen ? (
            <WeighBackNote
              spot={chosen}
              netNowKg={weighBack.netNowKg}
              issueKg={weighBack.issueKg}
            />
          ) : null}

          <button
            type="submit"
            className={
              primary
                ? "button-primary min-h-12 w-full text-lg"
                : "button-quiet min-h-12 w-full"
            }
            disabled={busy}
          >
            {busy
              ? "Issuing…"
              : issueKg !== null && issueKg > 0
                ? `Issue ${formatQuantity(issueKg, "kg", 3)} to ${order.reference}`
                : `Issue to ${order.reference}`}
          </button>
        </Form>
      )}
    </section>
  );
}

function IssueField(
  props: Omit<React.ComponentProps<typeof MeasureField>, "id">,
) {
  return (
    <MeasureField
      id={`issue-${props.name}`}
      inputMode="decimal"
      autoComplete="off"
      {...props}
    />
  );
}
