import { getInputProps } from "@conform-to/react";
import type { NewItemFields } from "./use-new-item-form";

const kindChoices = [
  { kind: "wire", label: "Magnet wire", detail: "kept in kg, on spools" },
  { kind: "magnet", label: "Permanent magnet", detail: "kept in pieces" },
  {
    kind: "part",
    label: "Other part",
    detail: "bearings, shafts, laminations …",
  },
] as const;

/** "What is it?": the new item's kind as three large radio choices. */
export function ItemKindChoice({ field }: { field: NewItemFields["kind"] }) {
  return (
    <fieldset aria-describedby={field.errors ? field.errorId : undefined}>
      <legend className="field-label">What is it?</legend>
      <div className="mt-1 grid gap-2 sm:grid-cols-3">
        {kindChoices.map((choice) => {
          const { key, ...radioProps } = getInputProps(field, {
            type: "radio",
            value: choice.kind,
          });
          return (
            <label
              key={choice.kind}
              className="relative flex cursor-pointer flex-col rounded-md border border-graphite-300 bg-white px-3 py-2 has-checked:border-copper-500 has-checked:bg-copper-50 has-focus-visible:outline-2 has-focus-visible:outline-copper-500"
            >
              <input
                key={key}
                {...radioProps}
                className="absolute inset-0 z-10 cursor-pointer opacity-0"
              />
              <span className="font-medium">{choice.label}</span>
              <span className="text-xs text-graphite-500">{choice.detail}</span>
            </label>
          );
        })}
      </div>
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </fieldset>
  );
}
