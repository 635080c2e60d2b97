/**
 * The demo company's purchasing: four invented suppliers, their price lists
 * imported from CSV files made here (through the same import as the Prices
 * page), the copper and aluminium base over the last months, dollar rates, and
 * the latest deliveries. Every name, address and figure is invented for the
 * demo; the adders follow the common practice of a larger adder for finer wire.
 */
import { and, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, wireItems } from "~/db/schema";
import { findAwgSize } from "~/engineering/reference-data";
import type { ColumnMapping } from "~/price-lists/column-mapping";
import { companyCurrencyRateRefusal } from "~/purchasing/currency-rate-rules";
import { importPriceList } from "~/purchasing/price-import.server";
import {
  currencyRateSchema,
  metalBaseSchema,
  supplierSchema,
} from "~/purchasing/supplier-schemas";
import {
  companyCurrency,
  createSupplier,
  setCurrencyRate,
  setMetalBase,
} from "~/purchasing/suppliers.server";
import { updateItem } from "~/stock/catalogue.server";
import { movementRequestSchema } from "~/stock/movement-request";
import { recordMovement } from "~/stock/stock-movements.server";
import { attachDemoLotSuppliers } from "./demo-lot-origins";
import { demoPersonId } from "./demo-person-ids";

const dayMs = 86_400_000;

/** The calendar day `days` days before today, YYYY-MM-DD (UTC). */
export function daysAgo(days: number): string {
  return new Date(Date.now() - days * dayMs).toISOString().slice(0, 10);
}

/** "2025-03-01" → "01.03.2025", as a German supplier writes it. */
function dayFirst(isoDate: string): string {
  const [year, month, day] = isoDate.split("-");
  return `${day}.${month}.${year}`;
}

const round2 = (value: number) => Math.round(value * 100) / 100;

// ——— Metal base and currency rates (invented, in the range of recent years) ———

const copperBaseEur: [number, number][] = [
  [118, 8.74],
  [89, 8.91],
  [61, 9.18],
  [33, 9.02],
  [5, 9.27],
];
const aluminiumBaseEur: [number, number][] = [
  [118, 2.31],
  [61, 2.39],
  [33, 2.44],
  [5, 2.42],
];
/** Euros per US dollar. */
const dollarRates: [number, number][] = [
  [118, 0.9234],
  [89, 0.9318],
  [61, 0.9172],
  [33, 0.9096],
  [5, 0.9141],
];

/** The copper base in euros on a day `days` ago: the latest entry on or before it. */
function copperBaseOn(days: number): number {
  let base = copperBaseEur[0]![1];
  for (const [ago, price] of copperBaseEur) if (ago >= days) base = price;
  return base;
}

// ——— Suppliers ———

const quillan = {
  name: "Quillan Drawn Wire GmbH",
  email: "verkauf@quillan-wire.example.test",
  currency: "EUR",
  leadTimeDays: 21,
  notes:
    "Enamelled copper wire in IEC sizes, priced on the copper base plus an adder per kg. Files come semicolon-separated with decimal commas. Minimum order 2 kg per size.",
};
const fenwright = {
  name: "Fenwright Windings Oy",
  email: "orders@fenwright.example.test",
  currency: "EUR",
  leadTimeDays: 28,
  notes:
    "AWG heavy-build wire and a range of IEC sizes; copper base plus adder. Better adders from 10 kg.",
};
const marrowfield = {
  name: "Marrowfield Magnet Supply Inc.",
  email: "quotes@marrowfield-magnets.example.test",
  currency: "USD",
  leadTimeDays: 45,
  notes:
    "Sintered NdFeB and SmCo, quoted per piece in US dollars. Ships magnets in spacer trays, packed for air freight.",
};
const corbel = {
  name: "Corbel Motor Parts BV",
  email: "sales@corbel-parts.example.test",
  currency: "EUR",
  leadTimeDays: 14,
  notes:
    "Laminations, housings, shafts, bearings and insulation parts; also ferrite and small NdFeB magnets from stock.",
};

// ——— Wire price lists ———

interface CatalogueWire {
  sku: string;
  standard: "AWG" | "IEC";
  size: string;
  /** Bare diameter, mm. */
  diameterMm: number;
}

async function catalogueWires(): Promise<CatalogueWire[]> {
  const rows = await db
    .select({
      sku: items.sku,
      standard: wireItems.standard,
      size: wireItems.sizeLabel,
      conductor: wireItems.conductor,
    })
    .from(wireItems)
    .innerJoin(
      items,
      and(eq(items.id, wireItems.itemId), eq(items.active, true)),
    )
    .orderBy(items.id);
  return rows
    .filter((row) => row.conductor === "copper")
    .map((row) => ({
      sku: row.sku,
      standard: row.standard as "AWG" | "IEC",
      size: row.size,
      diameterMm:
        row.standard === "AWG"
          ? (findAwgSize(row.size)?.bareDiameterMm ?? 0.5)
          : Number(row.size),
    }));
}

/** Quillan's adder per kg at its 2 kg break: more drawing and enamelling work per kg for fine wire. */
function quillanAdder(wire: CatalogueWire, revised: boolean): number {
  const adder = 3.6 + 1.0 / wire.diameterMm;
  // The later list: a surcharge on enamel, more for the fine sizes.
  const surcharge = revised ? 0.3 + (wire.diameterMm < 0.4 ? 0.25 : 0) : 0;
  return round2(adder + surcharge);
}

function fenwrightAdder(wire: CatalogueWire): number {
  return round2(3.75 + 0.95 / wire.diameterMm);
}

/** Quillan's file: semicolons, decimal commas, German headings, day-first dates. */
function quillanCsv(
  wires: CatalogueWire[],
  validFrom: string,
  revised: boolean,
) {
  const lines = [
    "Artikel-Nr.;Bezeichnung;Norm;Nenn-Ø mm;Zuschlag je kg;ab Menge kg;gültig ab",
  ];
  const comma = (value: number) => value.toFixed(2).replace(".", ",");
  for (const wire of wires.filter(
    (candidate) => candidate.standard === "IEC",
  )) {
    const adder = quillanAdder(wire, revised);
    const code = `QDW-${wire.size.replace(".", "")}`;
    const text = `CuL-Draht ${wire.size.replace(".", ",")} mm IEC 60317`;
    for (const [minKg, less] of [
      [2, 0],
      [25, 0.25],
      [100, 0.5],
    ] as const) {
      lines.push(
        [
          code,
          text,
          "IEC",
          wire.size.replace(".", ","),
          comma(adder - less),
          String(minKg),
          dayFirst(validFrom),
        ].join(";"),
      );
    }
  }
  return lines.join("\r\n") + "\r\n";
}

const quillanMapping: ColumnMapping = [
  { header: "Artikel-Nr.", field: "supplierSku" },
  { header: "Bezeichnung", field: "description" },
  { header: "Norm", field: "standard" },
  { header: "Nenn-Ø mm", field: "size" },
  { header: "Zuschlag je kg", field: "adderPerKg" },
  { header: "ab Menge kg", field: "minQuantity" },
  { header: "gültig ab", field: "validFrom" },
];

function fenwrightCsv(wires: CatalogueWire[], validFrom: string) {
  const lines = [
    "SKU,Description,Standard,Size,Build,Adder/kg,Min kg,Valid from",
  ];
  const quoted = wires.filter(
    (wire) =>
      wire.standard === "AWG" ||
      (wire.diameterMm >= 0.315 && wire.diameterMm <= 1.0),
  );
  for (const wire of quoted) {
    const adder = fenwrightAdder(wire);
    const awg = wire.standard === "AWG";
    const code = awg
      ? `FW-A${wire.size}-HB`
      : `FW-M${wire.size.replace(".", "")}`;
    const text = awg
      ? `Magnet wire AWG ${wire.size} heavy build class 155`
      : `Magnet wire ${wire.size} mm`;
    for (const [minKg, less] of [
      [10, 0.3],
      [50, 0.7],
    ] as const) {
      lines.push(
        [
          code,
          `"${text}"`,
          wire.standard,
          wire.size,
          awg ? "heavy" : "",
          (adder - less).toFixed(2),
          String(minKg),
          validFrom,
        ].join(","),
      );
    }
  }
  return lines.join("\n") + "\n";
}

const fenwrightMapping: ColumnMapping = [
  { header: "SKU", field: "supplierSku" },
  { header: "Description", field: "description" },
  { header: "Standard", field: "standard" },
  { header: "Size", field: "size" },
  { header: "Build", field: "insulation" },
  { header: "Adder/kg", field: "adderPerKg" },
  { header: "Min kg", field: "minQuantity" },
  { header: "Valid from", field: "validFrom" },
];

// ——— Magnet and part price lists ———

/** Marrowfield's quotes per catalogue magnet, US dollars per piece at 1 / 100 / 500 pieces. */
const marrowfieldMagnets: {
  sku: string;
  code: string;
  text: string;
  grade: string;
  prices: [number, number, number];
}[] = [
  {
    sku: "MG-N38UH-A28",
    code: "MMS-AR-2824-30-38UH",
    text: "Arc R28/R24 x 30 deg x 25, N38UH, epoxy, radial",
    grade: "N38UH",
    prices: [2.55, 2.28, 2.06],
  },
  {
    sku: "MG-N35EH-A40",
    code: "MMS-AR-4035-36-35EH",
    text: "Arc R40/R35 x 36 deg x 40, N35EH, epoxy, radial",
    grade: "N35EH",
    prices: [5.4, 4.95, 4.6],
  },
  {
    sku: "MG-N45SH-R2210",
    code: "MMS-RG-2210-4-45SH",
    text: "Ring OD22/ID10 x 4, N45SH, NiCuNi, axial",
    grade: "N45SH",
    prices: [1.28, 1.15, 1.04],
  },
  {
    sku: "MG-SMCO-D85",
    code: "MMS-DS-8-5-SC17",
    text: "Disc D8 x 5, Sm2Co17, uncoated, axial",
    grade: "Sm2Co17",
    prices: [2.9, 2.62, 2.41],
  },
  {
    sku: "MG-N52-D103",
    code: "MMS-DS-10-3-N52",
    text: "Disc D10 x 3, N52, NiCuNi, axial",
    grade: "N52",
    prices: [0.39, 0.34, 0.3],
  },
];

/** The buyer added our SKU beside the supplier's part number, so each row prices its catalogue magnet. */
function marrowfieldCsv(validFrom: string) {
  const lines = [
    "Part Number,Our SKU,Description,Grade,Min Qty,Unit Price,Effective",
  ];
  for (const magnet of marrowfieldMagnets) {
    magnet.prices.forEach((price, index) => {
      lines.push(
        [
          magnet.code,
          magnet.sku,
          `"${magnet.text}"`,
          magnet.grade,
          String([1, 100, 500][index]),
          price.toFixed(2),
          validFrom,
        ].join(","),
      );
    });
  }
  return lines.join("\n") + "\n";
}

const marrowfieldMapping: ColumnMapping = [
  { header: "Part Number", field: "supplierSku" },
  { header: "Our SKU", field: "itemSku" },
  { header: "Description", field: "description" },
  { header: "Grade", field: "grade" },
  { header: "Min Qty", field: "minQuantity" },
  { header: "Unit Price", field: "price" },
  { header: "Effective", field: "validFrom" },
];

/** Corbel's parts: new to the catalogue, so the import adds them as items. */
export const corbelParts = {
  lamination: "LAM-12S90-25",
  housing: "HSG-90-F86",
  shaft: "SHF-15-120",
  bearing: "BRG-6202-C3HT",
  wedge: "WDG-GE-3x25",
  liner: "SLN-AR-018",
  leadWire: "LWR-PTFE-075",
} as const;

const corbelRows: {
  code: string;
  text: string;
  grade?: string;
  sku?: string;
  unit: "pcs" | "m";
  breaks: [number, number][];
}[] = [
  {
    code: corbelParts.lamination,
    text: "Stator lamination stack 12 slots, Ø90 × 25 mm, bore Ø57.4, 0.35 mm steel, bonded",
    unit: "pcs",
    breaks: [
      [1, 19.8],
      [25, 17.9],
      [100, 16.4],
    ],
  },
  {
    code: corbelParts.housing,
    text: "Aluminium housing for Ø90 stator, 86 mm square flange, IP54",
    unit: "pcs",
    breaks: [
      [1, 26.5],
      [20, 23.9],
    ],
  },
  {
    code: corbelParts.shaft,
    text: "Rotor shaft Ø15 × 120 mm, keyed, ground journals",
    unit: "pcs",
    breaks: [
      [1, 5.4],
      [50, 4.7],
    ],
  },
  {
    code: corbelParts.bearing,
    text: "Deep-groove ball bearing 6202-2RS C3, high-temperature grease",
    unit: "pcs",
    breaks: [
      [1, 2.85],
      [100, 2.35],
    ],
  },
  {
    code: corbelParts.wedge,
    text: "Glass-epoxy slot wedge 3 × 25 mm",
    unit: "pcs",
    breaks: [
      [100, 0.085],
      [1000, 0.062],
    ],
  },
  {
    code: corbelParts.liner,
    text: "Aramid-paper slot liner 0.18 mm, cut for 25 mm stacks",
    unit: "pcs",
    breaks: [
      [100, 0.11],
      [1000, 0.082],
    ],
  },
  {
    code: corbelParts.leadWire,
    text: "PTFE-insulated lead wire 0.75 mm², 200 °C",
    unit: "m",
    breaks: [
      [10, 0.62],
      [100, 0.48],
    ],
  },
  {
    code: "FER-A5547-60",
    text: "Hard ferrite arc C5 R55/R47 60° × 40 mm",
    grade: "C5",
    sku: "MG-FER-A55",
    unit: "pcs",
    breaks: [
      [1, 0.61],
      [200, 0.52],
    ],
  },
  {
    code: "NDD-10x3-N52",
    text: "NdFeB disc N52 Ø10 × 3 mm, NiCuNi",
    grade: "N52",
    sku: "MG-N52-D103",
    unit: "pcs",
    breaks: [
      [1, 0.33],
      [500, 0.27],
      [3000, 0.235],
    ],
  },
];

/** New parts have no SKU of ours yet (the import adds them); the magnets carry ours. */
function corbelCsv(validFrom: string) {
  const lines = [
    "Item code,Our SKU,Description,Grade,Unit,From qty,Price EUR,Valid from",
  ];
  for (const row of corbelRows) {
    for (const [minQuantity, price] of row.breaks) {
      lines.push(
        [
          row.code,
          row.grade ? (row.sku ?? "") : "",
          `"${row.text}"`,
          row.grade ?? "",
          row.unit,
          String(minQuantity),
          price.toFixed(3),
          validFrom,
        ].join(","),
      );
    }
  }
  return lines.join("\n") + "\n";
}

const corbelMapping: ColumnMapping = [
  { header: "Item code", field: "supplierSku" },
  { header: "Our SKU", field: "itemSku" },
  { header: "Description", field: "description" },
  { header: "Grade", field: "grade" },
  { header: "Unit", field: "unit" },
  { header: "From qty", field: "minQuantity" },
  { header: "Price EUR", field: "price" },
  { header: "Valid from", field: "validFrom" },
];

async function importDemoList(
  supplierName: string,
  fileName: string,
  csv: string,
  mapping: ColumnMapping,
  buyerId: string,
): Promise<void> {
  const outcome = await importPriceList({
    supplierName,
    fileName,
    bytes: new TextEncoder().encode(csv),
    mapping,
    dryRun: false,
    userId: buyerId,
  });
  if (outcome.kind !== "imported")
    throw new Error(
      `The demo price list ${fileName} was not imported: ${JSON.stringify(outcome).slice(0, 800)}`,
    );
}

/** What the demo designs and builds need from purchasing. */
export interface DemoPurchasing {
  /** The catalogue SKU the import gave each Corbel part. */
  corbelSku: Record<keyof typeof corbelParts, string>;
}

/** The catalogue SKU the price-list import gives a new supplier SKU (as the importer names it). */
function importedItemSku(supplierId: number, supplierSku: string): string {
  return `S${supplierId}-${supplierSku}`
    .replace(/[^A-Za-z0-9._/-]/g, "-")
    .slice(0, 40);
}

/** Wire spools delivered last week, for the demo builds: SKU, supplier lot, net kg. */
const freshSpools: [string, string, number][] = [
  ["CU-IEC-0500", "Q-25-11873", 5.02],
  ["CU-IEC-0800", "Q-25-11874", 4.98],
];

export async function seedDemoPurchasing(): Promise<DemoPurchasing> {
  const buyerId = demoPersonId("buyer");
  const storekeeperId = demoPersonId("storekeeper");

  for (const [days, price] of copperBaseEur)
    await setMetalBase(
      metalBaseSchema.parse({
        conductor: "copper",
        currency: "EUR",
        pricePerKg: price,
        validFrom: daysAgo(days),
      }),
      buyerId,
    );
  for (const [days, price] of aluminiumBaseEur)
    await setMetalBase(
      metalBaseSchema.parse({
        conductor: "aluminium",
        currency: "EUR",
        pricePerKg: price,
        validFrom: daysAgo(days),
      }),
      buyerId,
    );
  const home = await companyCurrency();
  for (const [days, rate] of dollarRates) {
    const input = currencyRateSchema.parse({
      currency: "USD",
      rate,
      validFrom: daysAgo(days),
    });
    if (companyCurrencyRateRefusal(input.currency, home)) break;
    await setCurrencyRate(input, buyerId);
  }

  const ids = new Map<string, number>();
  for (const supplier of [quillan, fenwright, marrowfield, corbel])
    ids.set(
      supplier.name,
      await createSupplier(supplierSchema.parse(supplier)),
    );

  await attachDemoLotSuppliers([
    ids.get(quillan.name)!,
    ids.get(fenwright.name)!,
  ]);

  const wires = await catalogueWires();
  await importDemoList(
    quillan.name,
    `quillan-preisliste-${daysAgo(105)}.csv`,
    quillanCsv(wires, daysAgo(105), false),
    quillanMapping,
    buyerId,
  );
  await importDemoList(
    marrowfield.name,
    "marrowfield-magnet-quote.csv",
    marrowfieldCsv(daysAgo(90)),
    marrowfieldMapping,
    buyerId,
  );
  await importDemoList(
    fenwright.name,
    "fenwright-price-list.csv",
    fenwrightCsv(wires, daysAgo(70)),
    fenwrightMapping,
    buyerId,
  );
  await importDemoList(
    corbel.name,
    "corbel-parts-prices.csv",
    corbelCsv(daysAgo(45)),
    corbelMapping,
    buyerId,
  );
  // Quillan's revised list: an enamel surcharge, so the wire's price history steps up.
  await importDemoList(
    quillan.name,
    `quillan-preisliste-${daysAgo(30)}.csv`,
    quillanCsv(wires, daysAgo(30), true),
    quillanMapping,
    buyerId,
  );

  // The buyer sets reorder points on the parts the import added; the storekeeper receives them.
  const corbelId = ids.get(corbel.name)!;
  const corbelSku = Object.fromEntries(
    Object.entries(corbelParts).map(([key, code]) => [
      key,
      importedItemSku(corbelId, code),
    ]),
  ) as DemoPurchasing["corbelSku"];
  const partStock: [keyof typeof corbelParts, number, number, number][] = [
    // part, reorder point, reorder quantity, received
    ["lamination", 10, 40, 12],
    ["housing", 6, 20, 15],
    ["shaft", 10, 50, 30],
    ["bearing", 20, 100, 40],
    ["wedge", 100, 1000, 400],
    ["liner", 100, 1000, 400],
    ["leadWire", 10, 100, 50],
  ];
  const deliveredAt = Date.now() - 26 * 3_600_000;
  for (const [
    index,
    [part, reorderPoint, reorderQuantity, received],
  ] of partStock.entries()) {
    await updateItem(corbelSku[part], { reorderPoint, reorderQuantity });
    const row = corbelRows.find(
      (candidate) => candidate.code === corbelParts[part],
    )!;
    const unitCost =
      [...row.breaks]
        .reverse()
        .find(([minQuantity]) => minQuantity <= received)?.[1] ??
      row.breaks[0]![1];
    await recordMovement(
      movementRequestSchema.parse({
        type: "receipt",
        sku: corbelSku[part],
        location: "PARTS-C1",
        quantity: received,
        unitCost,
        reference: "DN-CMP-20417",
      }),
      storekeeperId,
      { at: new Date(deliveredAt + index * 60_000) },
    );
  }

  // Fresh spools from Quillan for the builds, at the revised list's price.
  for (const [index, [sku, lot, netKg]] of freshSpools.entries()) {
    const wire = wires.find((candidate) => candidate.sku === sku);
    if (!wire) continue;
    await recordMovement(
      movementRequestSchema.parse({
        type: "receipt",
        sku,
        lot,
        location: wire.diameterMm < 0.5 ? "WIRE-A1" : "WIRE-A2",
        grossKg: round2(netKg + 0.6),
        tareKg: 0.6,
        unitCost: round2(copperBaseOn(2) + quillanAdder(wire, true)),
        spoolType: "DIN 250",
        supplierBatch: `QB${88410 + index}`,
        supplierId: ids.get(quillan.name),
        reference: "DN-QDW-55102",
      }),
      storekeeperId,
      { at: new Date(deliveredAt + (10 + index) * 60_000) },
    );
  }
  // The last count found the varnish used up; a new drum came in with the wire.
  await recordMovement(
    movementRequestSchema.parse({
      type: "receipt",
      sku: "PT-VARNISH",
      location: "PARTS-C1",
      quantity: 20,
      unitCost: 16.9,
      supplierBatch: "VB-7731",
      reference: "DN-VAR-3381",
    }),
    storekeeperId,
    { at: new Date(deliveredAt + 20 * 60_000) },
  );
  return { corbelSku };
}
