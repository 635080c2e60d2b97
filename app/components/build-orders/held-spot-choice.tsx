/** The issue form's choice of held stock: one radio per lot and location held for the order, oldest lot first. */
import type { HeldSpot } from "~/build-orders/build-order-view";
import { formatQuantity } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function HeldSpotChoice({
  spots,
  chosenKey,
  onChoose,
  errors,
}: {
  spots: HeldSpot[];
  chosenKey: string;
  onChoose: (key: string) => void;
  errors?: string[];
}) {
  return (
    <fieldset>
      <legend className="field-label">Held stock (oldest lot first)</legend>
      <div className="mt-2 grid gap-2">
        {spots.map((spot) => (
          <label
            key={spot.key}
            className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border border-graphite-300 bg-white px-3 py-2 has-checked:border-copper-500 has-checked:bg-copper-50"
          >
            <input
              type="radio"
              name="spot"
              value={spot.key}
              checked={chosenKey === spot.key}
              onChange={() => onChoose(spot.key)}
              className="h-5 w-5 shrink-0 accent-copper-600"
            />
            <span className="min-w-0 flex-1 text-sm">
              <strong>{spot.sku}</strong>{" "}
              {spot.lot ? <>lot {spot.lot}</> : null} at {spot.location}
              {spot.tareKg !== null ? (
                <span className="block text-xs text-graphite-500">
                  spool net {formatQuantity(spot.onHand, "kg", 3)}, tare{" "}
                  {formatQuantity(spot.tareKg, "kg", 3)}
                </span>
              ) : null}
            </span>
            <span className="text-right text-sm font-medium whitespace-nowrap">
              {formatStockQuantity(spot.quantity, spot.unit)}
              <span className="block text-xs font-normal text-graphite-500">
                held
              </span>
            </span>
          </label>
        ))}
      </div>
      {errors ? <p className="field-error">{errors.join(" ")}</p> : null}
    </fieldset>
  );
}
