import { asc, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { publishedOverallDiameters, wireSizes } from "~/db/schema";
import { circleAreaMm2 } from "~/engineering/wire-geometry";

/** Wire sizes of one standard, thickest first for AWG and thinnest first for IEC, with published overall diameters. */
export async function listWireSizes(standard: "AWG" | "IEC") {
  const sizes = await db
    .select({
      label: wireSizes.label,
      gaugeNumber: wireSizes.gaugeNumber,
      series: wireSizes.series,
      bareDiameterMm: wireSizes.bareDiameterMm,
      source: wireSizes.source,
    })
    .from(wireSizes)
    .where(eq(wireSizes.standard, standard))
    .orderBy(asc(wireSizes.bareDiameterMm));
  const published = await db
    .select({
      sizeLabel: publishedOverallDiameters.sizeLabel,
      insulationKey: publishedOverallDiameters.insulationKey,
      maxOverallDiameterMm: publishedOverallDiameters.maxOverallDiameterMm,
      source: publishedOverallDiameters.source,
    })
    .from(publishedOverallDiameters)
    .where(eq(publishedOverallDiameters.standard, standard));
  const ordered = standard === "AWG" ? sizes.reverse() : sizes;
  return ordered.map((size) => {
    const bareDiameterMm = Number(size.bareDiameterMm);
    return {
      standard,
      size: size.label,
      gaugeNumber: size.gaugeNumber,
      series: size.series,
      bareDiameterMm,
      areaMm2: circleAreaMm2(bareDiameterMm),
      source: size.source,
      publishedOverallDiametersMm: Object.fromEntries(
        published
          .filter((row) => row.sizeLabel === size.label)
          .map((row) => [row.insulationKey, Number(row.maxOverallDiameterMm)]),
      ) as Record<string, number>,
    };
  });
}
