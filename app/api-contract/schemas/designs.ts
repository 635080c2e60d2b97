/**
 * The answers of the designs operations as the contract describes them: designs and
 * their revisions with their lines (app/designs/design-revisions.server.ts revisionView,
 * lineView), a revision's costing (app/designs/design-costing.server.ts costRevision),
 * substitutes from stock for a coil line, and the cost and stock-value insight. Money is
 * in the company currency as JSON numbers to 0.0001. Examples (./design-examples.ts) are
 * the demo's. Pure: Zod only.
 */
import { z } from "zod";
import { itemKinds } from "~/db/tables/stock-enums";
import {
  designCheckNames,
  type DesignWarningCode,
} from "~/designs/design-checks";
import { costingBases } from "~/designs/design-queries";
import { revisionFieldsSchema } from "~/designs/design-schemas";
import { phaseConnections } from "~/engineering/motor-constants";
import {
  designCostingExample,
  designExample,
  designInsightExample,
  designRevisionExample,
  designSummaryExample,
  stockValueExample,
  wireSubstitutesExample,
} from "./design-examples";

/** Revision statuses (app/db/tables/designs.ts revisionStatuses). */
const revisionStatus = z.enum(["draft", "released"]).meta({
  description:
    "A draft is changed freely; a released revision is locked for good and can be built.",
});
/** Design line kinds (app/db/tables/designs.ts designLineKinds). */
const lineKind = z.enum(["coil", "magnet", "part"]);
const torqueBasis = revisionFieldsSchema.shape.torqueBasis.meta({
  description: "Whether the rated torque was measured or estimated.",
});
const costingBasis = z.enum(costingBases).meta({
  description:
    "The prices used: `best-price` (best current supplier price for the quantity) or `stock-average` (moving average cost of stock).",
});
const money = (description: string) =>
  z.number().meta({ description: `${description}, company currency.` });
const optionalMoney = (description: string) =>
  z
    .number()
    .nullable()
    .meta({ description: `${description}, company currency.` });
const utcTime = z.iso.datetime().meta({ description: "ISO 8601, UTC." });
const calendarDay = z.iso.date().meta({ description: "YYYY-MM-DD." });

// ---------------------------------------------------------------- designs and revisions

const designRevisionSummarySchema = z.object({
  revision: z.number().int().min(1),
  status: revisionStatus,
  ratedTorqueNm: z.number().nullable(),
  torqueBasis,
});

export const designSummarySchema = z
  .object({
    id: z.number().int().meta({ description: "The design's number." }),
    name: z.string(),
    motorType: z.string(),
    revisions: z
      .array(designRevisionSummarySchema)
      .meta({ description: "Newest first." }),
  })
  .meta({
    id: "DesignSummary",
    description: "A design with its revisions, as the list gives it.",
    example: designSummaryExample,
  });

export const designListSchema = z.array(designSummarySchema).meta({
  id: "DesignList",
  description: "Designs by name.",
  example: [designSummaryExample],
});

export const createdDesignSchema = z
  .object({
    id: z.number().int().meta({ description: "The new design's number." }),
    revision: z.literal(1).meta({ description: "Revision 1, a draft." }),
  })
  .meta({
    id: "CreatedDesign",
    description:
      "The design made, with its first revision as a draft (no lines yet).",
    example: { id: 4, revision: 1 },
  });

export const designSchema = z
  .object({
    id: z.number().int(),
    name: z.string(),
    description: z.string(),
    motorType: z.string(),
    revisions: z
      .array(
        designRevisionSummarySchema.extend({
          releasedAt: utcTime.nullable(),
        }),
      )
      .meta({ description: "Newest first." }),
  })
  .meta({
    id: "Design",
    description: "A design with all its revisions.",
    example: designExample,
  });

export const startedRevisionSchema = z
  .object({ revision: z.number().int().min(2) })
  .meta({
    id: "StartedRevision",
    description: "The number of the new draft revision.",
    example: { revision: 3 },
  });

export const releasedRevisionSchema = z
  .object({
    revision: z.number().int().min(1),
    status: z.literal("released"),
  })
  .meta({
    id: "ReleasedRevision",
    example: { revision: 2, status: "released" },
  });

const lineItem = {
  sku: z.string(),
  itemName: z.string().meta({ description: "The catalogue item's name." }),
};

const coilLineViewSchema = z
  .object({
    kind: z.literal("coil"),
    ...lineItem,
    turns: z.number().int(),
    strandsInHand: z.number().int(),
    activeLengthMm: z.number(),
    endTurnLengthMm: z.number(),
    leadLengthMm: z.number(),
    coilsPerMotor: z.number().int(),
    scrapPercent: z.number(),
    operatingTemperatureC: z.number(),
  })
  .meta({
    id: "CoilLine",
    description: "Coils wound from a magnet wire item.",
  });

const magnetLineViewSchema = z
  .object({
    kind: z.literal("magnet"),
    ...lineItem,
    piecesPerMotor: z.number().int(),
    operatingTemperatureC: z.number().nullable(),
  })
  .meta({ id: "MagnetLine", description: "Magnet pieces per motor." });

const partLineViewSchema = z
  .object({
    kind: z.literal("part"),
    ...lineItem,
    unit: z.string(),
    quantityPerMotor: z.number(),
  })
  .meta({ id: "PartLine", description: "Any other part, in its unit." });

const revisionLineSchema = z.discriminatedUnion("kind", [
  coilLineViewSchema,
  magnetLineViewSchema,
  partLineViewSchema,
]);

export const designRevisionSchema = z
  .object({
    designId: z.number().int(),
    name: z.string(),
    description: z.string(),
    motorType: z.string(),
    revision: z.number().int().min(1),
    status: revisionStatus,
    poles: z.number().int(),
    slots: z.number().int(),
    ratedCurrentA: z
      .number()
      .meta({ description: "RMS phase current of a sinusoidal drive, A." }),
    ratedTorqueNm: z.number().nullable(),
    torqueBasis,
    insulationClassC: z.number().int(),
    slotAreaMm2: z.number().nullable(),
    slotLinerAreaMm2: z.number().nullable(),
    coilSidesPerSlot: z.number().int(),
    phases: z.number().int(),
    windingLayers: z.number().int(),
    phaseConnection: z.enum(phaseConnections),
    parallelPaths: z.number().int(),
    ratedSpeedRpm: z.number().nullable(),
    airGapRadiusMm: z.number().nullable(),
    airGapFluxDensityT: z.number().nullable(),
    poleCoverage: z.number().nullable(),
    notes: z.string(),
    releasedAt: utcTime.nullable(),
    lines: z.array(revisionLineSchema).meta({ description: "In their order." }),
  })
  .meta({
    id: "DesignRevision",
    description: "A revision's fields and its lines (the BOM of one motor).",
    example: designRevisionExample,
  });

// ---------------------------------------------------------------- costing

export const costSplitSchema = z
  .object({
    activeCopper: money("Wire in the slots"),
    endTurnCopper: money("Wire in the end turns"),
    leadsAndScrap: money("Wire in the leads and the scrap allowance"),
    magnets: money("Magnets"),
    parts: money("Other parts"),
  })
  .meta({
    id: "CostSplit",
    description:
      "Where the cost of one motor goes; the five add up exactly to the whole.",
    example: designCostingExample.split,
  });

const perNmTorqueSchema = z
  .object({
    torqueNm: z.number(),
    source: z.enum(["rated", "estimated"]).meta({
      description:
        "`rated`: the revision's rated torque; `estimated`: the first-order estimate, used when no rated torque is given.",
    }),
  })
  .nullable()
  .meta({
    description:
      "The torque figures per N·m are taken over; null when there is neither.",
  });

const unpricedLineSchema = z.object({ kind: lineKind, sku: z.string() });

const massBasis = z.enum(["enamelled", "bare"]).meta({
  description:
    "Whether the wire's kg are of enamelled wire, or of bare conductor only (a lower bound, when the wire's linear mass is not known).",
});

const motorConstantsSchema = z
  .object({
    coilsPerPhase: z.number(),
    seriesTurnsPerPhase: z.number(),
    ktNmPerA: z
      .number()
      .meta({ description: "N·m per A of RMS phase current." }),
    ktLineNmPerA: z
      .number()
      .meta({ description: "N·m per A of RMS line current." }),
    kePhaseRmsVsPerRad: z.number(),
    keLineToLineRmsVsPerRad: z.number(),
    keLineToLinePeakVsPerRad: z.number(),
  })
  .meta({
    id: "MotorConstants",
    example: designCostingExample.torqueEstimate.constants,
    description: "First-order Kt and Ke of the winding.",
  });

/** A figure, or why there is none (app/designs/winding-figures.ts Figure). */
function figureOf(value: z.ZodType, description: string) {
  return z
    .union([
      z.object({ value }),
      z.object({
        unavailable: z.string().meta({
          description: "What is missing, or why it cannot be worked out.",
        }),
      }),
    ])
    .meta({ description });
}

const windingFiguresSchema = z
  .object({
    currentBasis: z.string(),
    winding: z.object({
      slots: z.number().int(),
      poles: z.number().int(),
      layers: z.number().int(),
      phases: z.number().int(),
      connection: z.enum(phaseConnections),
      parallelPaths: z.number().int(),
    }),
    windingFactor: figureOf(
      z.object({
        fundamental: z.number(),
        coilPitch: z.number().int(),
        kind: z.enum(["concentrated", "distributed"]),
        harmonics: z.array(
          z.object({ order: z.number().int(), factor: z.number() }),
        ),
      }),
      "The winding factors, fundamental first.",
    ),
    coilCountNote: z.string().nullable().meta({
      description:
        "Set when the coil lines give another number of coils than the winding has.",
    }),
    constants: figureOf(motorConstantsSchema, "Kt and Ke."),
    resistance: figureOf(
      z.object({
        lineToLine20Ohm: z.number(),
        lineToLineHotOhm: z.number(),
        phase20Ohm: z.number(),
        phaseHotOhm: z.number(),
        operatingTemperaturesC: z.array(z.number()),
      }),
      "Resistance at 20 °C and at the coils' operating temperature.",
    ),
    electricalFrequency: figureOf(
      z.number(),
      "Electrical frequency at the rated speed, Hz.",
    ),
  })
  .meta({
    id: "WindingFigures",
    example: designCostingExample.winding,
    description:
      "The winding's figures, each with what is missing instead when it cannot be worked out.",
  });

const torqueEstimateSchema = z
  .union([
    z.object({
      basis: z.literal("first-order"),
      label: z.string(),
      currentBasis: z.string(),
      torqueNm: z.number(),
      fluxDensityT: z.number(),
      fundamentalFluxDensityT: z.number(),
      windingFactor: z.number(),
      constants: motorConstantsSchema,
      forceLengthM: z.number(),
      poleCoverage: z.number(),
      poleCoverageSource: z.string(),
    }),
    z.object({
      label: z.string(),
      missing: z.string().meta({
        description: "What is missing, or why the winding refuses it.",
      }),
    }),
  ])
  .meta({
    id: "TorqueEstimate",
    example: designCostingExample.torqueEstimate,
    description:
      "The first-order torque estimate (never a measured torque), or why there is none.",
  });

const costedLineSchema = z.object({
  kind: lineKind,
  sku: z.string(),
  perMotorQuantity: z.number().meta({
    description:
      "Per motor in `unit`: wire kg drawn from stock (scrap included), magnet pieces, parts as given.",
  }),
  unit: z.string(),
  unitPrice: optionalMoney("Price per unit; null when the item has no price"),
  priceSource: z.string().nullable(),
  cost: optionalMoney("Cost per motor; null when unpriced"),
  massBasis: massBasis.nullable(),
});

const coilFiguresSchema = z.object({
  line: z.number().int().meta({ description: "The line's position, from 1." }),
  sku: z.string(),
  copperLengthM: z.number(),
  drawnMassKg: z.number(),
  massBasis,
  resistance20PerCoilOhm: z.number(),
  resistancePerCoilOhm: z.number(),
  operatingTemperatureC: z.number(),
  activeShare: z.number(),
  copperLossW: z.number().nullable(),
  forceLengthM: z.number(),
  currentDensityAPerMm2: z.number().nullable(),
  skinDepthMm: z.number().nullable(),
  acResistanceRatio: z.number().nullable(),
  copperFill: z.number().nullable(),
  grossFill: z.number().nullable(),
});

const warningCodes = Object.keys(designCheckNames) as [
  DesignWarningCode,
  ...DesignWarningCode[],
];

export const designCostingSchema = z
  .object({
    quantity: z.number().int().min(1),
    currency: z.string(),
    costPerMotor: money("Σ of the priced lines' costs for one motor"),
    ratedTorqueNm: z.number().nullable(),
    perNmTorque: perNmTorqueSchema,
    costPerNm: optionalMoney("Cost per motor ÷ the torque; null without one"),
    split: costSplitSchema,
    lines: z.array(costedLineSchema),
    complete: z
      .boolean()
      .meta({ description: "False when a line has no price." }),
    unpriced: z.array(unpricedLineSchema),
    basis: costingBasis,
    torqueBasis,
    copperLossW: z.number(),
    copperLossPerNm: z.number().nullable(),
    torqueEstimate: torqueEstimateSchema,
    winding: windingFiguresSchema,
    coils: z.array(coilFiguresSchema),
    warnings: z.array(
      z.object({
        code: z.enum(warningCodes),
        line: z.number().int(),
        sku: z.string(),
        message: z.string(),
      }),
    ),
    itemsNeeded: z
      .array(z.object({ sku: z.string(), quantity: z.number() }))
      .meta({
        description:
          "Stock needed for the whole quantity, per item, in its unit (rounded up to 0.001).",
      }),
  })
  .meta({
    id: "DesignCosting",
    example: designCostingExample,
    description:
      "The costing of a revision for a number of motors, with its coil figures, the torque estimate and the design's checks.",
  });

// ---------------------------------------------------------------- substitutes from stock

export const wireSubstitutesSchema = z
  .object({
    line: z.object({
      position: z.number().int(),
      sku: z.string(),
      strands: z.number().int(),
    }),
    tolerancePercent: z.number(),
    substitutes: z
      .array(
        z.object({
          sku: z.string(),
          itemId: z.number().int().meta({
            description:
              "The wire item's internal number (other operations name items by SKU).",
          }),
          name: z.string(),
          strands: z.number().int(),
          bareDiameterMm: z.number(),
          areaChangePercent: z.number(),
          resistanceChangePercent: z.number(),
          copperLossChangeW: z.number().nullable(),
          massChangeKg: z.number(),
          massPerMotorKg: z.number(),
          copperFill: z.number().nullable(),
          grossFill: z.number().nullable(),
          costPerMotorChange: optionalMoney(
            "Change of the wire's cost per motor at moving average cost; null when a cost is unknown",
          ),
          onHandKg: z.number(),
        }),
      )
      .meta({ description: "Closest copper area first." }),
  })
  .meta({
    id: "WireSubstitutes",
    example: wireSubstitutesExample,
    description:
      "Wire in stock that can stand in for a coil line's wire within the copper-area tolerance, fitting the slot.",
  });

// ---------------------------------------------------------------- insight

const designInsightSchema = z
  .object({
    designId: z.number().int(),
    name: z.string(),
    motorType: z.string(),
    revision: z.number().int(),
    releasedAt: utcTime.nullable(),
    ratedTorqueNm: z.number().nullable(),
    torqueBasis,
    perNmTorque: perNmTorqueSchema,
    basis: costingBasis,
    ratedCurrentA: z.number(),
    quantity: z.number().int(),
    currency: z.string(),
    costPerMotor: money("Cost of one motor"),
    costPerNm: optionalMoney("Cost per N·m"),
    split: costSplitSchema,
    splitPerNm: costSplitSchema.nullable(),
    copperLossW: z.number(),
    copperLossPerNm: z.number().nullable(),
    complete: z.boolean(),
    unpriced: z.array(unpricedLineSchema),
    endTurnScale: z.number().meta({
      description: "The what-if's end-turn factor (1 = as designed).",
    }),
    asStored: z
      .object({
        costPerMotor: z.number(),
        costPerNm: z.number().nullable(),
        copperLossPerNm: z.number().nullable(),
        complete: z.boolean(),
      })
      .nullable()
      .meta({
        description:
          "The same figures without the what-if; null when no what-if applies to this design.",
      }),
    costHistory: z
      .array(
        z.object({
          date: calendarDay,
          costPerMotor: z.number(),
          costPerNm: z.number().nullable(),
          complete: z.boolean(),
        }),
      )
      .optional()
      .meta({
        description:
          "With `history=1`: the cost per motor a month apart over the last year, at the best supplier price of each day.",
      }),
  })
  .meta({
    id: "DesignInsight",
    example: designInsightExample,
    description:
      "The latest released revision of a design, costed (with the what-if when given).",
  });

export const designInsightListSchema = z.array(designInsightSchema).meta({
  id: "DesignInsightList",
  description: "Newest design first.",
  example: [designInsightExample],
});

export const stockValueSchema = z
  .object({
    currency: z.string(),
    total: money("On hand × moving average cost of every item"),
    byKind: z.array(
      z.object({
        kind: z.enum(itemKinds),
        value: z.number(),
        items: z
          .number()
          .int()
          .meta({ description: "Items of the kind with a value." }),
      }),
    ),
    byLocation: z
      .array(
        z.object({
          locationId: z.number().int().meta({
            description: "The location's internal number.",
          }),
          code: z.string(),
          name: z.string(),
          value: z.number(),
          items: z.number().int(),
        }),
      )
      .meta({ description: "The 50 locations of most value, most first." }),
    otherLocations: z
      .object({ locations: z.number().int(), value: z.number() })
      .nullable()
      .meta({ description: "The locations beyond the first 50, summed." }),
    reservedValue: money("Held for build orders"),
    belowReorderPoint: z.number().int(),
    openAlerts: z.number().int(),
    trend: z
      .array(
        z.object({
          week: calendarDay.meta({
            description: "The Monday the week starts.",
          }),
          value: z.number(),
          complete: z.boolean().meta({
            description: "False for the running week, valued now.",
          }),
        }),
      )
      .meta({ description: "The last 26 weeks, oldest first." }),
  })
  .meta({
    id: "StockValue",
    example: stockValueExample,
    description:
      "What the store is worth now, by kind and location, and week by week.",
  });
