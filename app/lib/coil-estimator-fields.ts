/**
 * The coil estimator form's zod-free parts: its starting values and where the API's
 * field names land on it. The page uses them before its schema is loaded
 * (coil-estimator-form.ts, which re-exports them, is loaded after hydration).
 */

/** Where the API's field names land on the form. */
export function formFieldOfApiField(apiField: string): string {
  const fields: Record<string, string> = {
    "wire.size": "awgSize",
    "wire.diameterMm": "iecDiameterMm",
    "wire.strandWire.size": "awgSize",
    "wire.strandWire.diameterMm": "iecDiameterMm",
    "wire.strands": "litzStrands",
    "wire.bunchingSteps": "litzBunchingSteps",
    "wire.takeUpFactor": "litzStrands",
    "wire.packingFactor": "litzStrands",
    "wire.thicknessMm": "flatThicknessMm",
    "wire.cornerRadiusMm": "flatThicknessMm",
    "wire.widthMm": "flatWidthMm",
    "thermal.ambientC": "ambientC",
    "thermal.thermalResistanceKPerW": "thermalResistanceKPerW",
    "thermal.temperatureRiseK": "temperatureRiseK",
  };
  if (fields[apiField]) return fields[apiField];
  if (apiField.startsWith("wire")) return "standard";
  if (apiField.startsWith("harmonics")) return "frequencyHz";
  return apiField;
}

/** The form's starting values: worked check 4 of the engineering brief, a small tooth coil. */
export const coilEstimatorDefaults = {
  conductor: "copper",
  wireForm: "round",
  standard: "IEC",
  awgSize: "20",
  iecDiameterMm: "0.800",
  insulation: "grade2",
  litzStrands: "",
  litzBunchingSteps: "1",
  flatThicknessMm: "",
  flatWidthMm: "",
  flatEdgewise: "flat",
  turns: "40",
  strandsInHand: "1",
  activeLengthMm: "50",
  endTurnLengthMm: "30",
  leadLengthMm: "150",
  coilCount: "12",
  temperatureC: "120",
  scrapPercent: "3",
  currentA: "10",
  frequencyHz: "",
  layersPerCoil: "",
  ambientC: "",
  thermalResistanceKPerW: "",
  temperatureRiseK: "",
} as const;
