/** What a label shows: the data of a lot's or a location's label and its printed code. Types only. */

export interface LotLabelData {
  lotId: number;
  sku: string;
  itemName: string;
  sizeOrGrade: string;
  kind: "wire" | "magnet" | "part";
  unit: string;
  lotNumber: string;
  supplierBatch: string | null;
  supplierName: string | null;
  receivedOn: string | null;
  /** Empty spool mass, kg (wire lots). */
  tareKg: number | null;
  /** Net on hand of this lot, all locations together, in the item's unit. */
  onHand: number;
  /** Where the lot has stock, by location code (several when it was split). */
  locations: string[];
  /** A magnet batch: its grade, shape and coating, and the grade's working limit. */
  magnet: {
    grade: string;
    shape: string;
    coating: string;
    magnetisation: string;
    maxWorkingTemperatureC: number | null;
  } | null;
}

export interface LocationLabelData {
  code: string;
  name: string;
  kind: "store" | "bin";
}

export interface PrintedCode {
  /** The bare code printed under the QR: "L123". */
  text: string;
  /** What the QR holds: "<public address>/scan/L123". */
  url: string;
  qrSvg: string;
}

export type LotLabel = LotLabelData & { scan: PrintedCode };
export type LocationLabel = LocationLabelData & { scan: PrintedCode };

/** What a scanned code stands for, as GET /api/v1/scan-lookup answers it. */
export type ScanLookupAnswer =
  | {
      kind: "lot";
      code: string;
      lotId: number;
      sku: string;
      name: string;
      lot: string;
      unit: string;
      /** Net on hand of the lot, all locations together. */
      onHand: number;
      /** The one location the lot has stock at; null when none or several. */
      location: string | null;
      locations: string[];
    }
  | { kind: "location"; code: string; name: string };
