import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { useEffect, useRef, useState } from "react";

export interface ItemChoice {
  sku: string;
  name: string;
  sizeOrGrade: string;
  unit: string;
}

/**
 * A catalogue item picked by SKU: the choices come from GET /api/v1/items as the
 * builder types (name, SKU, size or grade), only of `kind` when given, so even a
 * catalogue of many thousand items stays quick. The server checks the SKU again.
 */
export function DesignItemPicker({
  field,
  label,
  kind,
  hint,
  knownItem,
  onPick,
}: {
  field: FieldMetadata<string | undefined>;
  label: string;
  kind?: "wire" | "magnet";
  hint?: string;
  /** The item the line has now, so its name shows before any search. */
  knownItem?: { sku: string; name: string };
  /** Told the item whose SKU the field now holds exactly, or undefined (e.g. to show its unit beside a quantity). */
  onPick?: (item: ItemChoice | undefined) => void;
}) {
  const [choices, setChoices] = useState<ItemChoice[]>([]);
  const [searched, setSearched] = useState(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const request = useRef<AbortController | undefined>(undefined);
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      request.current?.abort();
    },
    [],
  );

  const pickFrom = (text: string, list: ItemChoice[]) =>
    onPick?.(
      list.find(
        (choice) => choice.sku.toLowerCase() === text.trim().toLowerCase(),
      ),
    );

  function search(text: string) {
    pickFrom(text, choices);
    clearTimeout(timer.current);
    timer.current = setTimeout(async () => {
      request.current?.abort();
      const controller = new AbortController();
      request.current = controller;
      const params = new URLSearchParams({ pageSize: "20" });
      if (kind) params.set("kind", kind);
      if (text.trim()) params.set("search", text.trim().slice(0, 80));
      try {
        const response = await fetch(`/api/v1/items?${params}`, {
          signal: controller.signal,
          headers: { Accept: "application/json" },
        });
        if (!response.ok) return;
        const body = (await response.json()) as { items: ItemChoice[] };
        setChoices(body.items);
        setSearched(true);
        pickFrom(text, body.items);
      } catch {
        // A newer search replaced this one, or the network failed: keep the last choices.
      }
    }, 200);
  }

  const { key, ...inputProps } = getInputProps(field, { type: "text" });
  const value = typeof field.value === "string" ? field.value.trim() : "";
  const picked =
    choices.find(
      (choice) => choice.sku.toLowerCase() === value.toLowerCase(),
    ) ??
    (knownItem && knownItem.sku.toLowerCase() === value.toLowerCase()
      ? { ...knownItem, sizeOrGrade: "" }
      : undefined);
  const listId = `${field.id}-choices`;
  const describedBy = [field.errors ? field.errorId : null, field.descriptionId]
    .filter(Boolean)
    .join(" ");

  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
        <span className="font-normal text-graphite-500"> (SKU)</span>
      </label>
      <input
        key={key}
        {...inputProps}
        list={listId}
        autoComplete="off"
        spellCheck={false}
        onFocus={() => {
          if (!searched) search(value);
        }}
        onInput={(event) => search(event.currentTarget.value)}
        aria-invalid={field.errors ? true : undefined}
        aria-describedby={describedBy}
        className="field-input"
      />
      <datalist id={listId}>
        {choices.map((choice) => (
          <option key={choice.sku} value={choice.sku}>
            {[choice.name, choice.sizeOrGrade].filter(Boolean).join(" · ")}
          </option>
        ))}
      </datalist>
      <p id={field.descriptionId} className="mt-1 text-xs text-graphite-500">
        {picked ? (
          <span className="text-graphite-800">{picked.name}</span>
        ) : (
          (hint ?? "Type part of the name or SKU and pick from the list.")
        )}
      </p>
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
