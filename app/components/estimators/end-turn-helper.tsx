import { formatQuantity } from "~/lib/format";
import { useState } from "react";
import {
  endTurnLengthFromSlotPitchMm,
  endTurnLengthFromToothMm,
  type WindingLayout,
} from "~/engineering/end-turn-length";
import { isEngineeringInputError } from "~/engineering/errors";
import { typedNumber } from "~/lib/number-text";

type Model = "tooth" | "slot-pitch";

/** A field's number in the reader's locale ("12,5" in de-DE); NaN while empty or not a number. */
function parse(value: string): number {
  return typedNumber(value) ?? Number.NaN;
}

/**
 * The two first-order end-turn estimates of the engineering brief, computed in
 * the browser; "Use this length" hands the result to the form.
 */
export function EndTurnHelper({
  onUse,
}: {
  onUse: (lengthMm: number) => void;
}) {
  const [model, setModel] = useState<Model>("tooth");
  const [slotPitch, setSlotPitch] = useState("12");
  const [toothWidth, setToothWidth] = useState("6");
  const [coilThrow, setCoilThrow] = useState("1");
  const [radius, setRadius] = useState("40");
  const [slotCount, setSlotCount] = useState("12");
  const [layout, setLayout] = useState<WindingLayout>(
    "double-layer-tooth-coil",
  );

  let result: number | null = null;
  let problem: string | null = null;
  try {
    const values =
      model === "tooth"
        ? [parse(slotPitch), parse(toothWidth), parse(coilThrow)]
        : [parse(radius), parse(slotCount), parse(coilThrow)];
    if (values.some((value) => !Number.isFinite(value))) {
      problem = "Fill in every field with a number.";
    } else {
      result =
        model === "tooth"
          ? endTurnLengthFromToothMm({
              slotPitchMm: parse(slotPitch),
              toothWidthMm: parse(toothWidth),
              coilThrowSlots: parse(coilThrow),
            })
          : endTurnLengthFromSlotPitchMm({
              radiusMm: parse(radius),
              slotCount: parse(slotCount),
              layout,
              coilThrowSlots: parse(coilThrow),
            });
    }
  } catch (error) {
    if (!isEngineeringInputError(error)) throw error;
    problem = error.message;
  }

  const input = (
    label: string,
    value: string,
    set: (value: string) => void,
    unit?: string,
  ) => (
    <label className="block text-sm">
      <span className="field-label">
        {label}
        {unit ? (
          <span className="font-normal text-graphite-500"> ({unit})</span>
        ) : null}
      </span>
      <input
        className="field-input"
        inputMode="decimal"
        value={value}
        onChange={(event) => set(event.target.value)}
      />
    </label>
  );

  return (
    <details className="panel print:hidden">
      <summary className="cursor-pointer font-medium">
        Estimate the end-turn length from the lamination
      </summary>
      <fieldset className="mt-3 space-y-3">
        <legend className="sr-only">Model</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          <label className="inline-flex items-center gap-2">
            <input
              type="radio"
              name="end-turn-model"
              checked={model === "tooth"}
              onChange={() => setModel("tooth")}
              className="accent-copper-600"
            />
            From slot pitch and tooth width (Bianchi et al. 2006)
          </label>
          <label className="inline-flex items-center gap-2">
            <input
              type="radio"
              name="end-turn-model"
              checked={model === "slot-pitch"}
              onChange={() => setModel("slot-pitch")}
              className="accent-copper-600"
            />
            From radius and slot count (Magnussen and Sadarangani 2003)
          </label>
        </div>
        <div className="grid gap-3 sm:grid-cols-3">
          {model === "tooth" ? (
            <>
              {input("Slot pitch τu", slotPitch, setSlotPitch, "mm")}
              {input("Tooth width wt", toothWidth, setToothWidth, "mm")}
              {input("Coil throw y", coilThrow, setCoilThrow, "slots")}
            </>
          ) : (
            <>
              {input("Radius at the slots", radius, setRadius, "mm")}
              {input("Slots Q", slotCount, setSlotCount)}
              <label className="block text-sm">
                <span className="field-label">Winding</span>
                <select
                  className="field-input"
                  value={layout}
                  onChange={(event) =>
                    setLayout(event.target.value as WindingLayout)
                  }
                >
                  <option value="double-layer-tooth-coil">
                    tooth coils, double layer (kc 0.93)
                  </option>
                  <option value="single-layer-tooth-coil">
                    tooth coils, single layer (kc 1.36)
                  </option>
                  <option value="distributed">
                    distributed (kc = π/2 · y)
                  </option>
                </select>
              </label>
              {layout === "distributed"
                ? input("Coil throw y", coilThrow, setCoilThrow, "slots")
                : null}
            </>
          )}
        </div>
        <div className="flex items-center gap-4">
          <p className="text-sm" aria-live="polite">
            {result !== null ? (
              <>
                End turn, each end:{" "}
                <strong>{formatQuantity(result, "", 1)}&nbsp;mm</strong>
              </>
            ) : (
              <span className="text-danger">{problem}</span>
            )}
          </p>
          <button
            type="button"
            className="button-quiet"
            disabled={result === null}
            onClick={() => result !== null && onUse(Number(result.toFixed(1)))}
          >
            Use this length
          </button>
        </div>
        <p className="text-xs text-graphite-500">
          First-order estimates from published models; the real end-winding
          depends on the winding process. Measure a sample coil when it matters.
        </p>
      </fieldset>
    </details>
  );
}
