/**
 * The request of POST /api/v1/slot-fills: a wire size (as the coil estimate takes it),
 * strands, turns per coil side, coil sides per slot, the slot area and the liner and
 * separator area. Bounds are plausibility limits, as in estimate-requests.ts.
 */
import { formatNumber } from "~/lib/format";
import { z } from "zod";
import { insulationSchema, wireSpecSchema } from "./estimate-requests";

const whole = (label: string, max: number) =>
  z
    .number({ error: `Give ${label} as a whole number.` })
    .int(`${label[0]!.toUpperCase()}${label.slice(1)} must be a whole number.`)
    .min(1, `${label[0]!.toUpperCase()}${label.slice(1)} must be at least 1.`)
    .max(max, {
      error: () =>
        `${label[0]!.toUpperCase()}${label.slice(1)} must be at most ${formatNumber(max)}.`,
    });

const area = (label: string) =>
  z
    .number({ error: `Give ${label} in mm².` })
    .max(
      100_000,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 100,000 mm².`,
    );

export const slotFillRequestSchema = z
  .object({
    wire: wireSpecSchema,
    insulation: insulationSchema.nullish(),
    strands: whole("the strands", 1_000).default(1),
    turns: whole("the turns", 100_000),
    coilSidesPerSlot: whole("the coil sides per slot", 8).default(1),
    slotAreaMm2: area("the slot area").gt(
      0,
      "The slot area must be more than 0 mm².",
    ),
    linerAreaMm2: area("the liner and separator area")
      .min(0, "The liner and separator area cannot be negative.")
      .nullish(),
  })
  .superRefine((value, context) => {
    if (
      value.linerAreaMm2 !== null &&
      value.linerAreaMm2 !== undefined &&
      value.linerAreaMm2 >= value.slotAreaMm2
    )
      context.addIssue({
        code: "custom",
        path: ["linerAreaMm2"],
        message:
          "The liner and separator area must be less than the slot area: nothing would be left for the wire.",
      });
  });

export type SlotFillRequest = z.infer<typeof slotFillRequestSchema>;
