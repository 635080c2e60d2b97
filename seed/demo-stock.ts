/**
 * The demo store of the invented company: locations, a few dozen wire sizes on
 * spools, magnets in several grades and shapes, some parts, and about four
 * months of movements. Everything goes through the real catalogue and ledger
 * code, so the demo's balances obey the same rules as real ones. Prices and
 * quantities are invented for the demo.
 */
import { checkStockAlerts } from "~/alerts/stock-alerts.server";
import { db } from "~/db/client.server";
import { items, locations } from "~/db/schema";
import { createItem } from "~/stock/catalogue.server";
import type { ItemCreateInput } from "~/stock/item-schemas";
import { movementRequestSchema } from "~/stock/movement-request";
import { isDomainError } from "~/lib/domain-error";
import { recordMovement } from "~/stock/stock-movements.server";

const demoLocations = [
  { code: "MAIN", name: "Main store", kind: "store" as const },
  {
    code: "WIRE-A1",
    name: "Wire rack A, shelf 1 (fine gauges)",
    kind: "bin" as const,
  },
  {
    code: "WIRE-A2",
    name: "Wire rack A, shelf 2 (medium gauges)",
    kind: "bin" as const,
  },
  {
    code: "WIRE-A3",
    name: "Wire rack A, shelf 3 (heavy gauges)",
    kind: "bin" as const,
  },
  {
    code: "MAG-B1",
    name: "Magnet cabinet B, drawer 1 (spacers fitted)",
    kind: "bin" as const,
  },
  {
    code: "MAG-B2",
    name: "Magnet cabinet B, drawer 2 (spacers fitted)",
    kind: "bin" as const,
  },
  { code: "PARTS-C1", name: "Parts shelving C", kind: "bin" as const },
  { code: "BENCH", name: "Winding bench", kind: "bin" as const },
];

interface DemoWire {
  standard: "IEC" | "AWG";
  size: string;
  insulation: "grade1" | "grade2" | "grade3" | "single" | "heavy" | "triple";
  thermalClass: 155 | 180 | 200 | 220 | 130;
  enamel: string;
  pricePerKg: number;
  spoolKg: number;
  tareKg: number;
  bin: string;
}

const iecSizes: [string, number][] = [
  ["0.200", 17.9],
  ["0.250", 16.8],
  ["0.315", 15.9],
  ["0.355", 15.6],
  ["0.400", 15.2],
  ["0.450", 14.9],
  ["0.500", 14.6],
  ["0.560", 14.4],
  ["0.630", 14.2],
  ["0.710", 14.0],
  ["0.800", 13.9],
  ["0.900", 13.8],
  ["1.000", 13.7],
  ["1.120", 13.6],
  ["1.250", 13.5],
  ["1.400", 13.5],
  ["1.600", 13.4],
  ["1.800", 13.4],
  ["2.000", 13.3],
];
const awgSizes: [string, number][] = [
  ["14", 13.6],
  ["16", 13.8],
  ["18", 14.1],
  ["20", 14.6],
  ["22", 15.1],
  ["24", 15.7],
  ["26", 16.4],
  ["28", 17.2],
  ["30", 18.3],
];

function demoWires(): DemoWire[] {
  const wires: DemoWire[] = iecSizes.map(([size, price], index) => ({
    standard: "IEC",
    size,
    insulation: index % 5 === 0 ? "grade1" : "grade2",
    thermalClass: index % 3 === 0 ? 200 : 180,
    enamel: index % 3 === 0 ? "polyamide-imide-overcoat" : "polyesterimide",
    pricePerKg: price,
    spoolKg: Number(size) < 0.5 ? 2.5 : Number(size) < 1.2 ? 5 : 12,
    tareKg: Number(size) < 0.5 ? 0.28 : Number(size) < 1.2 ? 0.6 : 1.1,
    bin:
      Number(size) < 0.5
        ? "WIRE-A1"
        : Number(size) < 1.2
          ? "WIRE-A2"
          : "WIRE-A3",
  }));
  for (const [size, price] of awgSizes) {
    wires.push({
      standard: "AWG",
      size,
      insulation: "heavy",
      thermalClass: 155,
      enamel: "polyurethane",
      pricePerKg: price,
      spoolKg: Number(size) >= 26 ? 2.5 : 5,
      tareKg: Number(size) >= 26 ? 0.28 : 0.6,
      bin: Number(size) >= 26 ? "WIRE-A1" : "WIRE-A2",
    });
  }
  return wires;
}

const demoMagnets: (ItemCreateInput & { kind: "magnet" } & {
  price: number;
  bin: string;
})[] = [
  {
    kind: "magnet",
    sku: "MG-N42SH-B20105",
    name: "NdFeB block N42SH 20 × 10 × 5 mm",
    grade: "N42SH",
    shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
    coating: "NiCuNi",
    magnetisation: "through 5 mm",
    reorderPoint: 400,
    reorderQuantity: 2000,
    price: 0.92,
    bin: "MAG-B1",
  },
  {
    kind: "magnet",
    sku: "MG-N42SH-B30124",
    name: "NdFeB block N42SH 30 × 12 × 4 mm",
    grade: "N42SH",
    shape: { kind: "block", lengthMm: 30, widthMm: 12, heightMm: 4 },
    coating: "NiCuNi",
    magnetisation: "through 4 mm",
    reorderPoint: 200,
    reorderQuantity: 1000,
    price: 1.35,
    bin: "MAG-B1",
  },
  {
    kind: "magnet",
    sku: "MG-N38UH-A28",
    name: "NdFeB arc N38UH R28/R24 30° × 25 mm",
    grade: "N38UH",
    shape: {
      kind: "arc",
      innerRadiusMm: 24,
      outerRadiusMm: 28,
      angleDeg: 30,
      axialLengthMm: 25,
    },
    coating: "epoxy",
    magnetisation: "radial",
    reorderPoint: 240,
    reorderQuantity: 960,
    price: 2.1,
    bin: "MAG-B1",
  },
  {
    kind: "magnet",
    sku: "MG-N35EH-A40",
    name: "NdFeB arc N35EH R40/R35 36° × 40 mm",
    grade: "N35EH",
    shape: {
      kind: "arc",
      innerRadiusMm: 35,
      outerRadiusMm: 40,
      angleDeg: 36,
      axialLengthMm: 40,
    },
    coating: "epoxy",
    magnetisation: "radial",
    reorderPoint: 100,
    reorderQuantity: 500,
    price: 4.6,
    bin: "MAG-B2",
  },
  {
    kind: "magnet",
    sku: "MG-N52-D103",
    name: "NdFeB disc N52 Ø10 × 3 mm",
    grade: "N52",
    shape: { kind: "disc", diameterMm: 10, thicknessMm: 3 },
    coating: "NiCuNi",
    magnetisation: "axial",
    reorderPoint: 500,
    reorderQuantity: 3000,
    price: 0.31,
    bin: "MAG-B2",
  },
  {
    kind: "magnet",
    sku: "MG-N45SH-R2210",
    name: "NdFeB ring N45SH Ø22/Ø10 × 4 mm",
    grade: "N45SH",
    shape: {
      kind: "ring",
      outerDiameterMm: 22,
      innerDiameterMm: 10,
      thicknessMm: 4,
    },
    coating: "NiCuNi",
    magnetisation: "axial",
    reorderPoint: 150,
    reorderQuantity: 600,
    price: 1.05,
    bin: "MAG-B2",
  },
  {
    kind: "magnet",
    sku: "MG-SMCO-D85",
    name: "Sm2Co17 disc Ø8 × 5 mm",
    grade: "Sm2Co17",
    shape: { kind: "disc", diameterMm: 8, thicknessMm: 5 },
    coating: "none",
    magnetisation: "axial",
    reorderPoint: 100,
    reorderQuantity: 400,
    price: 2.4,
    bin: "MAG-B2",
  },
  {
    kind: "magnet",
    sku: "MG-FER-A55",
    name: "Hard ferrite arc C5 R55/R47 60° × 40 mm",
    grade: "C5",
    shape: {
      kind: "arc",
      innerRadiusMm: 47,
      outerRadiusMm: 55,
      angleDeg: 60,
      axialLengthMm: 40,
    },
    coating: "none",
    magnetisation: "radial",
    reorderPoint: 80,
    reorderQuantity: 400,
    price: 0.55,
    bin: "MAG-B2",
  },
];

const demoParts: (ItemCreateInput & { kind: "part" } & {
  price: number;
  quantity: number;
})[] = [
  {
    kind: "part",
    sku: "PT-BRG-6202",
    name: "Deep-groove ball bearing 6202-2RS",
    unit: "pcs",
    reorderPoint: 40,
    reorderQuantity: 200,
    price: 1.9,
    quantity: 180,
  },
  {
    kind: "part",
    sku: "PT-BRG-6001",
    name: "Deep-groove ball bearing 6001-2RS",
    unit: "pcs",
    reorderPoint: 40,
    reorderQuantity: 200,
    price: 1.6,
    quantity: 150,
  },
  {
    kind: "part",
    sku: "PT-LAM-12S60",
    name: "Stator lamination stack 12 slots, Ø60 × 30 mm",
    unit: "pcs",
    reorderPoint: 20,
    reorderQuantity: 100,
    price: 11.5,
    quantity: 60,
  },
  {
    kind: "part",
    sku: "PT-LAM-24S90",
    name: "Stator lamination stack 24 slots, Ø90 × 40 mm",
    unit: "pcs",
    reorderPoint: 10,
    reorderQuantity: 50,
    price: 24.0,
    quantity: 25,
  },
  {
    kind: "part",
    sku: "PT-SHAFT-8",
    name: "Rotor shaft Ø8 × 95 mm",
    unit: "pcs",
    reorderPoint: 30,
    reorderQuantity: 150,
    price: 3.2,
    quantity: 90,
  },
  {
    kind: "part",
    sku: "PT-HSG-60",
    name: "Aluminium housing for Ø60 stator",
    unit: "pcs",
    reorderPoint: 15,
    reorderQuantity: 60,
    price: 18.4,
    quantity: 40,
  },
  {
    kind: "part",
    sku: "PT-SLV-PTFE",
    name: "PTFE sleeving 1.5 mm",
    unit: "m",
    reorderPoint: 50,
    reorderQuantity: 200,
    price: 0.42,
    quantity: 180,
  },
  {
    kind: "part",
    sku: "PT-VARNISH",
    name: "Impregnating varnish, class 180",
    unit: "kg",
    reorderPoint: 5,
    reorderQuantity: 20,
    price: 16.5,
    quantity: 18,
  },
];

/** A repeatable pseudo-random sequence, so every demo database looks the same. */
function randomSequence(seed: number) {
  let state = seed;
  return () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
}

const dayMs = 86_400_000;

export async function seedDemoStock(storekeeperId: string): Promise<void> {
  await db.insert(locations).values(demoLocations);
  const random = randomSequence(4242);
  const started = Date.now() - 120 * dayMs;
  let clock = started;
  const tick = (maxHours: number) => {
    clock += Math.floor(random() * maxHours * 3_600_000) + 60_000;
    return new Date(Math.min(clock, Date.now() - 3_600_000));
  };
  const record = async (body: Record<string, unknown>, at: Date) => {
    try {
      await recordMovement(movementRequestSchema.parse(body), storekeeperId, {
        at,
        checkAlerts: false,
      });
    } catch (error) {
      if (!isDomainError(error)) throw error; // a demo issue larger than the spool is simply skipped
    }
  };

  const wires = demoWires();
  const spools: {
    sku: string;
    lot: string;
    bin: string;
    netKg: number;
    tareKg: number;
  }[] = [];
  for (const [index, wire] of wires.entries()) {
    const label =
      wire.standard === "AWG" ? `AWG${wire.size}` : wire.size.replace(".", "");
    const sku = `CU-${wire.standard}-${label}`;
    await createItem(
      {
        kind: "wire",
        sku,
        name: `Enamelled copper ${wire.standard === "AWG" ? `AWG ${wire.size}` : `${wire.size} mm`}`,
        conductor: "copper",
        standard: wire.standard,
        size: wire.size,
        insulation: wire.insulation,
        thermalClass: wire.thermalClass,
        enamel: wire.enamel,
        reorderPoint: wire.spoolKg * 0.8,
        reorderQuantity: wire.spoolKg * 4,
      },
      storekeeperId,
    );
    const spoolCount = 1 + (index % 3);
    for (let spool = 1; spool <= spoolCount; spool += 1) {
      const lot = `S${String(24100 + index * 7 + spool)}`;
      const grossKg =
        Math.round(
          (wire.spoolKg + wire.tareKg + (random() - 0.5) * 0.2) * 1000,
        ) / 1000;
      await record(
        {
          type: "receipt",
          sku,
          lot,
          location: wire.bin,
          grossKg,
          tareKg: wire.tareKg,
          unitCost:
            Math.round(wire.pricePerKg * (0.97 + random() * 0.06) * 100) / 100,
          spoolType:
            wire.spoolKg > 6
              ? "DIN 355"
              : wire.spoolKg > 3
                ? "DIN 250"
                : "DIN 160",
          supplierBatch: `B${Math.floor(random() * 90000 + 10000)}`,
          reference: `DN-${3100 + index}`,
        },
        tick(20),
      );
      spools.push({
        sku,
        lot,
        bin: wire.bin,
        netKg: grossKg - wire.tareKg,
        tareKg: wire.tareKg,
      });
    }
  }

  for (const magnet of demoMagnets) {
    const { price, bin, ...item } = magnet;
    await createItem(item, storekeeperId);
    await record(
      {
        type: "receipt",
        sku: item.sku,
        location: bin,
        quantity: item.reorderQuantity,
        unitCost: price,
        supplierBatch: `M${Math.floor(random() * 9000 + 1000)}`,
        reference: "DN-MAG-1",
      },
      tick(30),
    );
  }
  for (const part of demoParts) {
    const { price, quantity, ...item } = part;
    await createItem(item, storekeeperId);
    await record(
      {
        type: "receipt",
        sku: item.sku,
        location: "PARTS-C1",
        quantity,
        unitCost: price,
        reference: "DN-PRT-1",
      },
      tick(30),
    );
  }

  // About four months of work at the bench: weigh-back issues, magnets and parts to builds, a few counts and scrap.
  for (let day = 0; day < 110 && clock < Date.now() - 2 * dayMs; day += 1) {
    // Workshop jobs before build orders were kept in the app: "JOB-…", not "BO-…".
    const buildOrder = `JOB-${1000 + day}`;
    for (let job = 0; job < 3; job += 1) {
      const spool = spools[Math.floor(random() * spools.length)]!;
      const takenKg =
        Math.round(spool.netKg * (0.05 + random() * 0.15) * 1000) / 1000;
      if (takenKg <= 0.01 || spool.netKg - takenKg < 0.1) continue;
      const grossKg =
        Math.round((spool.netKg - takenKg + spool.tareKg) * 1000) / 1000;
      await record(
        {
          type: "issue",
          sku: spool.sku,
          lot: spool.lot,
          location: spool.bin,
          grossKg,
          reference: buildOrder,
        },
        tick(8),
      );
      spool.netKg = grossKg - spool.tareKg;
    }
    const magnet = demoMagnets[Math.floor(random() * demoMagnets.length)]!;
    await record(
      {
        type: "issue",
        sku: magnet.sku,
        location: magnet.bin,
        quantity: 8 * (1 + Math.floor(random() * 4)),
        reference: buildOrder,
      },
      tick(6),
    );
    const part = demoParts[Math.floor(random() * demoParts.length)]!;
    await record(
      {
        type: "issue",
        sku: part.sku,
        location: "PARTS-C1",
        quantity: part.unit === "pcs" ? 2 : 1.5,
        reference: buildOrder,
      },
      tick(6),
    );
    if (day % 21 === 20) {
      await record(
        {
          type: "scrap",
          sku: magnet.sku,
          location: magnet.bin,
          quantity: 2,
          note: "chipped when separating",
        },
        tick(4),
      );
    }
    if (day % 30 === 29) {
      const counted = demoParts[Math.floor(random() * demoParts.length)]!;
      await record(
        {
          type: "count",
          sku: counted.sku,
          location: "PARTS-C1",
          quantity: Math.max(0, counted.quantity - 20),
          note: "monthly count",
        },
        tick(4),
      );
    }
  }

  // Alerts once at the end: demo items left below their reorder point open theirs now.
  const allItems = await db.select({ id: items.id }).from(items);
  await checkStockAlerts(allItems.map((item) => item.id));
}
