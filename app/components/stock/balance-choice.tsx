/**
 * The lot and location a movement takes from, one radio per balance, oldest lot first
 * (as the server lists them). With a build order chosen, what the order holds on each
 * balance is named beside it.
 */
import { formatQuantity } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export interface ChoosableBalance {
  lot: string | null;
  location: string;
  tareKg: number | null;
  onHand: number;
}

export function balanceKeyOf(balance: {
  lot: string | null;
  location: string;
}): string {
  return `${balance.lot ?? ""}|${balance.location}`;
}

export function BalanceChoice({
  legend,
  balances,
  unit,
  value,
  onChange,
  heldFor,
  errors,
}: {
  legend: string;
  balances: ChoosableBalance[];
  unit: string;
  value: string;
  onChange: (key: string) => void;
  /** The chosen build order and what it holds on a balance (null: nothing there). */
  heldFor?: { reference: string; heldOn: (key: string) => number | null };
  errors?: string[];
}) {
  return (
    <fieldset>
      <legend className="field-label">{legend}</legend>
      {balances.length === 0 ? (
        <p className="mt-2 text-sm text-graphite-500">
          Nothing of this item is in stock.
        </p>
      ) : (
        <div className="mt-2 grid gap-2">
          {balances.map((balance) => {
            const key = balanceKeyOf(balance);
            const held = heldFor?.heldOn(key) ?? null;
            return (
              <label
                key={key}
                className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border border-graphite-300 bg-white px-3 has-checked:border-copper-500 has-checked:bg-copper-50"
              >
                <input
                  type="radio"
                  name="balance"
                  value={key}
                  checked={value === key}
                  onChange={() => onChange(key)}
                  className="h-5 w-5 accent-copper-600"
                />
                <span className="flex-1">
                  {balance.lot ? (
                    <strong>lot {balance.lot}</strong>
                  ) : (
                    <strong>no lot</strong>
                  )}{" "}
                  at {balance.location}
                  {balance.tareKg !== null ? (
                    <span className="text-sm text-graphite-500">
                      {" "}
                      · tare {formatQuantity(balance.tareKg, "kg", 3)}
                    </span>
                  ) : null}
                  {heldFor && held !== null ? (
                    <span className="block text-sm text-copper-700">
                      {formatStockQuantity(held, unit)} held for{" "}
                      {heldFor.reference}
                    </span>
                  ) : null}
                </span>
                <span className="font-medium">
                  {formatStockQuantity(balance.onHand, unit)}
                </span>
              </label>
            );
          })}
        </div>
      )}
      {errors ? <p className="field-error">{errors.join(" ")}</p> : null}
    </fieldset>
  );
}
