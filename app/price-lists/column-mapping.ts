/**
 * Which column of a supplier's file holds which of our price-list fields.
 *
 * A mapping is a list of `{ header, field }` pairs: the file's column header
 * (as written in its header row) and the field it feeds. Columns not in the
 * mapping are ignored. The mapping a buyer confirms is saved per supplier, so
 * the next file from that supplier maps itself (see {@link suggestMapping}).
 *
 * Pure: runs in Node and in the browser. Its Zod schema is column-mapping-schema.ts
 * (the import page checks mappings without loading Zod).
 */

export const priceListFieldKeys = [
  "supplierSku",
  "itemSku",
  "description",
  "kind",
  "standard",
  "size",
  "grade",
  "insulation",
  "thermalClass",
  "unit",
  "price",
  "adderPerKg",
  "currency",
  "minQuantity",
  "validFrom",
  "leadTimeDays",
  "packQuantity",
] as const;

export type PriceListField = (typeof priceListFieldKeys)[number];

/**
 * When a field must be mapped:
 * - "required": always;
 * - "priceOrAdder": the price or the adder per kg (or both) must be mapped;
 * - "unlessSupplierCurrency": needed when the supplier has no default currency;
 * - "optional": never (kind is inferred when it is not mapped).
 */
export type FieldRequirement =
  "required" | "priceOrAdder" | "unlessSupplierCurrency" | "optional";

export interface PriceListFieldInfo {
  key: PriceListField;
  label: string;
  requirement: FieldRequirement;
  /** One sentence for the mapping screen. */
  hint: string;
}

export const PRICE_LIST_FIELDS: readonly PriceListFieldInfo[] = [
  {
    key: "supplierSku",
    label: "Supplier SKU",
    requirement: "required",
    hint: "The supplier's own article number for the item.",
  },
  {
    key: "itemSku",
    label: "Our SKU",
    requirement: "optional",
    hint: "Our own catalogue SKU, when the file has a column for it: the row then prices that item (its kind must match) and the supplier's SKU is tied to it.",
  },
  {
    key: "description",
    label: "Description",
    requirement: "optional",
    hint: "The supplier's text for the item, kept as written (up to 200 characters).",
  },
  {
    key: "kind",
    label: "Kind",
    requirement: "optional",
    hint: "Wire, magnet or part. When left out: rows with a wire standard and size are wire, rows with a magnet grade are magnets, the rest are parts.",
  },
  {
    key: "standard",
    label: "Wire standard",
    requirement: "optional",
    hint: "AWG or IEC.",
  },
  {
    key: "size",
    label: "Wire size",
    requirement: "optional",
    hint: "An AWG size from 4/0 to 46, or an IEC nominal diameter in mm such as 0.500.",
  },
  {
    key: "grade",
    label: "Magnet grade",
    requirement: "optional",
    hint: "A magnet grade such as N42SH.",
  },
  {
    key: "insulation",
    label: "Insulation",
    requirement: "optional",
    hint: "Grade 1, 2 or 3 for IEC wire; single, heavy or triple build for AWG wire.",
  },
  {
    key: "thermalClass",
    label: "Thermal class",
    requirement: "optional",
    hint: "130, 155, 180, 200 or 220 (or the letters B, F, H, N, R).",
  },
  {
    key: "unit",
    label: "Unit",
    requirement: "optional",
    hint: "kg, pcs or m. Wire is priced per kg and magnets per piece; parts default to pcs.",
  },
  {
    key: "price",
    label: "Price per unit",
    requirement: "priceOrAdder",
    hint: "The price for one unit. Map this, the adder per kg, or both.",
  },
  {
    key: "adderPerKg",
    label: "Adder per kg",
    requirement: "priceOrAdder",
    hint: "For wire priced on the metal base: what is added per kg to the copper or aluminium base price.",
  },
  {
    key: "currency",
    label: "Currency",
    requirement: "unlessSupplierCurrency",
    hint: "A three-letter code such as EUR. Not needed when the supplier has a default currency.",
  },
  {
    key: "minQuantity",
    label: "Minimum quantity",
    requirement: "optional",
    hint: "The quantity from which the price applies (quantity breaks). 1 when left out.",
  },
  {
    key: "validFrom",
    label: "Valid from",
    requirement: "optional",
    hint: "The day the price starts: 2025-03-01, 01.03.2025 or 01/03/2025. The import day when left out.",
  },
  {
    key: "leadTimeDays",
    label: "Lead time (days)",
    requirement: "optional",
    hint: "Whole days from order to delivery for this line (0 or more). The supplier's own lead time when left out.",
  },
  {
    key: "packQuantity",
    label: "Pack quantity",
    requirement: "optional",
    hint: "The spool or pack size the item is sold in, in the item's unit (kg of wire, pieces of magnets); orders are rounded up to whole packs. Any quantity when left out.",
  },
];

const fieldInfoByKey = new Map(
  PRICE_LIST_FIELDS.map((info) => [info.key, info]),
);

/** The label of a field, for messages: "Supplier SKU". */
export function priceListFieldLabel(field: PriceListField): string {
  return fieldInfoByKey.get(field)!.label;
}

export function isPriceListField(value: string): value is PriceListField {
  return fieldInfoByKey.has(value as PriceListField);
}

export interface ColumnMappingEntry {
  /** The column's header as written in the file's header row. */
  header: string;
  field: PriceListField;
}

export type ColumnMapping = readonly ColumnMappingEntry[];

/** The same mapping keyed by field, as it may be stored: `{ price: "Unit price", … }`. */
export type ColumnMappingByField = Partial<Record<PriceListField, string>>;

/** A mapping keyed by field as a list of entries (unknown keys are kept, for the check to report). */
export function columnMappingFromFields(
  byField: ColumnMappingByField,
): ColumnMappingEntry[] {
  return Object.entries(byField)
    .filter(
      (entry): entry is [PriceListField, string] => entry[1] !== undefined,
    )
    .map(([field, header]) => ({ header, field }));
}

/** A checked mapping keyed by field (a field mapped twice keeps its last column). */
export function columnMappingToFields(
  mapping: ColumnMapping,
): ColumnMappingByField {
  const byField: ColumnMappingByField = {};
  for (const { header, field } of mapping) byField[field] = header;
  return byField;
}

/** Where each mapped field's value is in a data row: the column index. */
export type FieldColumns = Partial<Record<PriceListField, number>>;

export interface MappingOptions {
  /** The supplier's default currency, used for rows without one. */
  supplierCurrency?: string | null;
}

/**
 * The one pair of fields that may read the same column: a file whose item code
 * is our own SKU gives it as the supplier's SKU too.
 */
export const sharedColumnFields: readonly PriceListField[] = [
  "supplierSku",
  "itemSku",
];

/** True when the fields given may read one column together (one field always may). */
export function mayShareColumn(fields: readonly PriceListField[]): boolean {
  if (fields.length <= 1) return true;
  return (
    new Set(fields).size === fields.length &&
    fields.every((field) => sharedColumnFields.includes(field))
  );
}

export type MappingCheck =
  { ok: true; columns: FieldColumns } | { ok: false; messages: string[] };

/**
 * Checks a mapping against the file's header row and turns it into column
 * indexes. Problems: a header that is not in the file (or is blank), a column
 * chosen for two fields (except Supplier SKU and Our SKU, see
 * {@link sharedColumnFields}), a field given two columns, and required fields
 * left unmapped.
 */
export function checkColumnMapping(
  mapping: ColumnMapping,
  headers: readonly string[],
  options: MappingOptions = {},
): MappingCheck {
  const messages: string[] = [];
  const columns: FieldColumns = {};
  const fieldsByHeader = new Map<string, PriceListField[]>();
  const headersByField = new Map<PriceListField, string[]>();

  for (const { header, field } of mapping) {
    if (!isPriceListField(field)) {
      messages.push(`"${field}" is not a price-list field.`);
      continue;
    }
    if (header.trim() === "") {
      messages.push(
        `The ${priceListFieldLabel(field)} field is given a column without a name; give the column a heading in the file.`,
      );
      continue;
    }
    const index = headers.indexOf(header);
    if (index === -1) {
      messages.push(
        `The column "${header}" (for ${priceListFieldLabel(field)}) is not in the file's header row.`,
      );
      continue;
    }
    fieldsByHeader.set(header, [...(fieldsByHeader.get(header) ?? []), field]);
    headersByField.set(field, [...(headersByField.get(field) ?? []), header]);
    columns[field] = index;
  }

  for (const [header, fields] of fieldsByHeader) {
    if (fields.length > 1 && !mayShareColumn(fields)) {
      messages.push(
        `The column "${header}" is chosen for ${listOf(fields.map(priceListFieldLabel))}; a column can feed one field only (only ${listOf(sharedColumnFields.map(priceListFieldLabel))} may share a column).`,
      );
    }
  }
  for (const [field, fieldHeaders] of headersByField) {
    if (fieldHeaders.length > 1) {
      messages.push(
        `${priceListFieldLabel(field)} is mapped twice, to ${listOf(fieldHeaders.map((header) => `"${header}"`))}; choose one column.`,
      );
    }
  }

  const mapped = (field: PriceListField) => headersByField.has(field);
  if (!mapped("supplierSku")) {
    messages.push("The mapping misses the supplier SKU column.");
  }
  if (!mapped("price") && !mapped("adderPerKg")) {
    messages.push(
      "The mapping misses the price column (or, for wire priced on the metal base, the adder per kg column).",
    );
  }
  if (!mapped("currency") && !options.supplierCurrency) {
    messages.push(
      "The mapping misses the currency column, and the supplier has no default currency.",
    );
  }

  return messages.length > 0 ? { ok: false, messages } : { ok: true, columns };
}

function listOf(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items.at(-1)}`;
}

// ---------------------------------------------------------------------------
// Suggesting a mapping
// ---------------------------------------------------------------------------

/** A suggested entry says where it came from, so the screen can ask the buyer to check guesses. */
export interface SuggestedColumn extends ColumnMappingEntry {
  source: "saved" | "guessed";
}

/**
 * Header spellings per field, written normalised (lower case, letters and
 * digits separated by single spaces, no accents). English first, then the
 * German, French and Italian words common in European supplier files.
 */
const headerSpellings: Readonly<Record<PriceListField, readonly string[]>> = {
  itemSku: [
    "our sku",
    "our item",
    "our article",
    "our part number",
    "catalogue sku",
    "catalog sku",
    "turnledger sku",
    "internal sku",
    "internal code",
  ],
  supplierSku: [
    "sku",
    "supplier sku",
    "art no",
    "art nr",
    "article",
    "article no",
    "article nr",
    "article number",
    "article code",
    "item no",
    "item nr",
    "item number",
    "item code",
    "part no",
    "part nr",
    "part number",
    "product code",
    "product no",
    "product number",
    "order code",
    "order no",
    "order number",
    "catalogue number",
    "catalog number",
    "cat no",
    "code",
    "ref",
    "reference",
    "artikelnummer",
    "artikel nr",
    "art nummer",
    "bestellnummer",
    "materialnummer",
    "reference article",
    "codice articolo",
  ],
  description: [
    "description",
    "item description",
    "product description",
    "name",
    "item name",
    "product name",
    "product",
    "designation",
    "text",
    "bezeichnung",
    "beschreibung",
    "artikelbezeichnung",
    "libelle",
    "descrizione",
  ],
  kind: ["kind", "item kind", "type", "item type", "product type", "category"],
  standard: [
    "standard",
    "wire standard",
    "gauge standard",
    "gauge system",
    "size standard",
    "norm",
  ],
  size: [
    "size",
    "wire size",
    "gauge",
    "wire gauge",
    "awg",
    "awg size",
    "diameter",
    "nominal diameter",
    "bare diameter",
    "conductor diameter",
    "dia",
    "grosse",
    "durchmesser",
    "nenndurchmesser",
    "diametre",
    "diametro",
  ],
  grade: [
    "grade",
    "magnet grade",
    "material grade",
    "magnet material",
    "magnet quality",
    "quality",
    "sorte",
    "qualitat",
    "nuance",
  ],
  insulation: [
    "insulation",
    "insulation grade",
    "insulation build",
    "enamel grade",
    "enamel build",
    "film build",
    "build",
    "isolation",
    "isolierung",
    "lackgrad",
  ],
  thermalClass: [
    "thermal class",
    "temperature class",
    "temp class",
    "thermal index",
    "temperature index",
    "thermal rating",
    "insulation class",
    "class",
    "warmeklasse",
    "temperaturklasse",
    "classe thermique",
  ],
  unit: [
    "unit",
    "uom",
    "unit of measure",
    "price unit",
    "pricing unit",
    "per",
    "einheit",
    "mengeneinheit",
    "preiseinheit",
    "unite",
  ],
  price: [
    "price",
    "unit price",
    "net price",
    "list price",
    "price per unit",
    "price each",
    "cost",
    "unit cost",
    "preis",
    "einzelpreis",
    "nettopreis",
    "stuckpreis",
    "prix",
    "prix unitaire",
    "prezzo",
  ],
  adderPerKg: [
    "adder",
    "adder per kg",
    "metal adder",
    "fabrication adder",
    "processing adder",
    "conversion adder",
    "fabrication cost",
    "processing cost",
    "conversion cost",
    "fabrication charge",
    "making charge",
    "premium",
    "verarbeitungszuschlag",
    "bearbeitungszuschlag",
  ],
  currency: [
    "currency",
    "cur",
    "curr",
    "ccy",
    "currency code",
    "wahrung",
    "devise",
    "valuta",
  ],
  minQuantity: [
    "min qty",
    "min quantity",
    "minimum qty",
    "minimum quantity",
    "min order qty",
    "min order quantity",
    "minimum order quantity",
    "moq",
    "break qty",
    "qty break",
    "quantity break",
    "price break",
    "from qty",
    "from quantity",
    "qty from",
    "quantity from",
    "qty",
    "quantity",
    "min",
    "ab menge",
    "mindestmenge",
    "staffel",
    "staffelmenge",
  ],
  validFrom: [
    "valid from",
    "valid since",
    "effective date",
    "effective from",
    "start date",
    "price date",
    "from date",
    "date",
    "gultig ab",
    "gultig von",
    "datum",
  ],
  leadTimeDays: [
    "lead time",
    "lead time days",
    "lead time d",
    "leadtime",
    "delivery time",
    "delivery days",
    "lieferzeit",
    "lieferzeit tage",
    "delai",
    "delai de livraison",
    "tempi di consegna",
  ],
  packQuantity: [
    "pack quantity",
    "pack qty",
    "pack size",
    "package quantity",
    "packing unit",
    "spool size",
    "spool weight",
    "spool kg",
    "verpackungseinheit",
    "vpe",
    "spulengewicht",
    "conditionnement",
  ],
};

/**
 * Words that rule a field out even when a spelling matches: a "Copper base
 * price" column is the metal base, not the row's price; "Valid until" is the
 * end of the price, not its start.
 */
const excludingWords: Readonly<
  Partial<Record<PriceListField, readonly string[]>>
> = {
  price: [
    "base",
    "basis",
    "metal",
    "copper",
    "cu",
    "aluminium",
    "aluminum",
    "al",
    "lme",
    "kupfer",
    "adder",
    "total",
  ],
  validFrom: ["to", "until", "till", "end", "expiry", "expires", "bis"],
};

/** Words that qualify a header without changing what it holds ("Price EUR/kg", "Diameter mm"). */
const qualifierWords: ReadonlySet<string> = new Set([
  "eur",
  "usd",
  "gbp",
  "chf",
  "kg",
  "pcs",
  "pc",
  "piece",
  "pieces",
  "ea",
  "each",
  "m",
  "mm",
  "per",
  "in",
  "net",
  "excl",
  "incl",
  "vat",
  "ex",
]);

/** "Art.-Nr." → "art nr", "Währung" → "wahrung", "Price EUR/kg" → "price eur kg". */
export function normaliseHeader(header: string): string {
  return header
    .normalize("NFD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/ß/g, "ss")
    .replace(/[^\p{L}\p{N}]+/gu, " ")
    .trim();
}

/**
 * How well a header matches a field: 3 for a known spelling, 2 for a known
 * spelling once qualifiers such as currency codes and units are dropped, 1 when
 * the header contains a known spelling of at least 4 letters as whole words,
 * 0 for no match or when the header has a word that rules the field out.
 */
function matchScore(header: string, field: PriceListField): number {
  const normalised = normaliseHeader(header);
  if (normalised === "") return 0;
  const words = normalised.split(" ");
  const excluded = excludingWords[field] ?? [];
  if (words.some((word) => excluded.includes(word))) return 0;
  const spellings = headerSpellings[field];
  if (spellings.includes(normalised)) return 3;
  const core = words.filter((word) => !qualifierWords.has(word)).join(" ");
  if (core !== "" && spellings.includes(core)) return 2;
  const padded = ` ${normalised} `;
  const contained = spellings.some(
    (spelling) => spelling.length >= 4 && padded.includes(` ${spelling} `),
  );
  return contained ? 1 : 0;
}

/**
 * A mapping for a new file. A header that the supplier's saved mapping names
 * exactly keeps its saved field; the other columns are guessed from their
 * header text ("Unit price" → price, "Art. no" → supplier SKU, "Min qty" →
 * minimum quantity). Each field is used at most once, and each column too
 * (a saved mapping may give one column both SKUs); the
 * best matches are placed first and ties go to the leftmost column.
 */
export function suggestMapping(
  headers: readonly string[],
  savedMapping?: ColumnMapping | null,
): SuggestedColumn[] {
  const chosen = new Map<number, SuggestedColumn[]>();
  const usedFields = new Set<PriceListField>();

  for (const { header, field } of savedMapping ?? []) {
    const index = headers.indexOf(header);
    if (index === -1 || header.trim() === "") continue;
    if (!isPriceListField(field) || usedFields.has(field)) continue;
    const sharing = chosen.get(index) ?? [];
    if (!mayShareColumn([...sharing.map((entry) => entry.field), field]))
      continue;
    chosen.set(index, [...sharing, { header, field, source: "saved" }]);
    usedFields.add(field);
  }

  const candidates: { index: number; field: PriceListField; score: number }[] =
    [];
  headers.forEach((header, index) => {
    if (chosen.has(index)) return;
    priceListFieldKeys.forEach((field) => {
      if (usedFields.has(field)) return;
      const score = matchScore(header, field);
      if (score > 0) candidates.push({ index, field, score });
    });
  });
  candidates.sort(
    (a, b) =>
      b.score - a.score ||
      a.index - b.index ||
      priceListFieldKeys.indexOf(a.field) - priceListFieldKeys.indexOf(b.field),
  );
  for (const { index, field } of candidates) {
    if (chosen.has(index) || usedFields.has(field)) continue;
    chosen.set(index, [{ header: headers[index]!, field, source: "guessed" }]);
    usedFields.add(field);
  }

  return [...chosen.entries()]
    .sort(([a], [b]) => a - b)
    .flatMap(([, entries]) => entries);
}
