/** What a design line's item field is called and offers, by the line's kind. Pure. */
export const lineItemTexts = {
  coil: {
    label: "Wire",
    itemKind: "wire",
    hint: "Only magnet-wire items: type part of the name or SKU.",
  },
  magnet: {
    label: "Magnet",
    itemKind: "magnet",
    hint: "Only magnet items: type part of the grade, name or SKU.",
  },
  part: {
    label: "Item",
    itemKind: undefined,
    hint: "Any catalogue item: bearing, shaft, lamination stack …",
  },
} as const satisfies Record<
  "coil" | "magnet" | "part",
  { label: string; itemKind: "wire" | "magnet" | undefined; hint: string }
>;
