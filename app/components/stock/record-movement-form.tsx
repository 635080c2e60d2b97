/**
 * The record-movement form for one item and one kind of movement: the item, the
 * receipt's fields or the fields of a movement from a balance, a note (the reason of
 * an adjustment) and the one button, which says what will be recorded. Validated in the
 * browser with the same schema the server uses, loaded after hydration (useBrowserValidation).
 */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { FormMessages } from "~/components/text-field";
import type { MovementType } from "~/db/tables/stock-enums";
import {
  movementFieldLabels,
  recordButtonText,
} from "~/stock/record-movement-texts";
import type { ChoosableBalance } from "./balance-choice";
import { BalanceMovementFields } from "./balance-movement-fields";
import type { PickableOrder } from "./build-order-picker";
import { MovementField, movementInputClass } from "./movement-field";
import { MovementItemHeading } from "./movement-item-heading";
import { ReceiptFields } from "./receipt-fields";
import { useMovementChoices } from "./use-movement-choices";

export interface MovementItem {
  sku: string;
  name: string;
  kind: string;
  sizeOrGrade: string | null;
  unit: string;
  onHand: number;
  available: number;
  balances: ChoosableBalance[];
}

export function RecordMovementForm({
  type,
  sku,
  item,
  scanned,
  locations,
  usualLocation,
  currency,
  orders,
  suppliers = [],
  metresPerKg,
  lastResult,
}: {
  type: MovementType;
  /** The SKU searched for (names the form). */
  sku: string;
  item: MovementItem;
  /** The lot and location of a scanned label, chosen to start with. */
  scanned: { lot: string | null; location: string | null };
  locations: { code: string; name: string }[];
  usualLocation: string | null;
  currency: string;
  orders: PickableOrder[];
  /** Who may have supplied a receipt (optional to name). */
  suppliers?: { id: number; name: string }[];
  metresPerKg: number | null;
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const validate = useBrowserValidation(
    () =>
      import("~/stock/movement-form").then(
        (module) => module.movementFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const [form] = useForm({
    id: `movement-${type}-${sku}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate: validate,
  });
  const errors = (form.allErrors ?? {}) as Record<string, string[] | undefined>;
  const unit = item.unit;
  const isWire = item.kind === "wire";
  const choices = useMovementChoices({
    type,
    isWire,
    balances: item.balances,
    orders,
    scanned,
  });

  return (
    <Form method="post" {...getFormProps(form)} className="panel space-y-5">
      <FormMessages id={form.errorId} errors={form.errors} />
      <input type="hidden" name="type" value={type} />
      <input type="hidden" name="sku" value={item.sku} />
      <MovementItemHeading item={item} />

      {type === "receipt" ? (
        <ReceiptFields
          scanned={scanned}
          unit={unit}
          isWire={isWire}
          locations={locations}
          usualLocation={usualLocation}
          currency={currency}
          suppliers={suppliers}
          errors={errors}
          inputClassName={movementInputClass}
        />
      ) : (
        <BalanceMovementFields
          scanned={scanned}
          type={type}
          unit={unit}
          isWire={isWire}
          balances={item.balances}
          locations={locations}
          orders={orders}
          metresPerKg={metresPerKg}
          choices={choices}
          errors={errors}
        />
      )}

      <MovementField
        name="note"
        label={movementFieldLabels(type).note}
        errors={errors.note}
        autoComplete="off"
        required={type === "adjustment"}
      />
      <button
        type="submit"
        className="button-primary min-h-12 w-full text-lg"
        disabled={busy}
      >
        {recordButtonText({
          type,
          busy,
          weighBackKg: choices.weighBack?.issueKg ?? null,
          orderReference: choices.order?.reference,
        })}
      </button>
    </Form>
  );
}
