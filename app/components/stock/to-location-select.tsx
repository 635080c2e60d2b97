/** Where a transfer takes stock to: every location but the one it leaves. */
import { movementInputClass } from "./movement-field";

export function ToLocationSelect({
  locations,
  from,
  errors,
}: {
  locations: { code: string; name: string }[];
  /** The location the stock leaves, left out of the choice. */
  from: string | undefined;
  errors?: string[];
}) {
  return (
    <div>
      <label htmlFor="movement-toLocation" className="field-label">
        To location
      </label>
      <select
        id="movement-toLocation"
        name="toLocation"
        className={movementInputClass}
        defaultValue=""
      >
        <option value="" disabled>
          choose…
        </option>
        {locations
          .filter((location) => location.code !== from)
          .map((location) => (
            <option key={location.code} value={location.code}>
              {location.code} · {location.name}
            </option>
          ))}
      </select>
      {errors ? <p className="field-error">{errors.join(" ")}</p> : null}
    </div>
  );
}
