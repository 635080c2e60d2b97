/**
 * The temperature suffixes of sintered NdFeB grades (N45 **SH**): the reference data's
 * grades are built from them. Their own module, so a page that only orders grades by
 * name (magnet-materials.ts) does not load the whole reference data.
 */

/** Temperature suffix of a sintered NdFeB grade; "" for none. */
export type NdfebSuffix = "" | "M" | "H" | "SH" | "UH" | "EH" | "AH";

/** Temperature suffixes in rising order with HcJ minimum (kA/m) and max working temperature (°C) (brief). */
export const NDFEB_SUFFIXES: readonly {
  suffix: NdfebSuffix;
  hcjMinKAm: number;
  maxWorkingTemperatureC: number;
}[] = [
  { suffix: "", hcjMinKAm: 955, maxWorkingTemperatureC: 80 },
  { suffix: "M", hcjMinKAm: 1114, maxWorkingTemperatureC: 100 },
  { suffix: "H", hcjMinKAm: 1353, maxWorkingTemperatureC: 120 },
  { suffix: "SH", hcjMinKAm: 1592, maxWorkingTemperatureC: 150 },
  { suffix: "UH", hcjMinKAm: 1990, maxWorkingTemperatureC: 180 },
  { suffix: "EH", hcjMinKAm: 2388, maxWorkingTemperatureC: 200 },
  { suffix: "AH", hcjMinKAm: 2786, maxWorkingTemperatureC: 220 },
];
