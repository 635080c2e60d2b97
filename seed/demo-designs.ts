/**
 * The demo company's motor designs, written through the app's design code: a
 * small outrunner (revision 1 released, revision 2 a draft trial), an
 * inner-rotor servo (released) and a moving-coil actuator still in draft. The
 * motors, their names and every figure are invented for the demo; the
 * geometry is kept plausible for the catalogue's laminations and magnets.
 */
import {
  createDesign,
  releaseRevision,
  startNewRevision,
  updateDraftRevision,
} from "~/designs/designs.server";
import {
  designLineSchema,
  newDesignSchema,
  revisionFieldsSchema,
  type DesignLineInput,
} from "~/designs/design-schemas";
import type { DemoPurchasing } from "./demo-purchasing";
import { demoPersonId } from "./demo-person-ids";

const coil = (
  sku: string,
  figures: {
    turns: number;
    strandsInHand: number;
    activeLengthMm: number;
    endTurnLengthMm: number;
    leadLengthMm: number;
    coilsPerMotor: number;
  },
  operatingTemperatureC = 120,
): DesignLineInput =>
  designLineSchema.parse({
    kind: "coil",
    sku,
    ...figures,
    scrapPercent: 3,
    operatingTemperatureC,
  });

const magnet = (sku: string, piecesPerMotor: number, temperatureC: number) =>
  designLineSchema.parse({
    kind: "magnet",
    sku,
    piecesPerMotor,
    operatingTemperatureC: temperatureC,
  });

const part = (sku: string, quantityPerMotor: number) =>
  designLineSchema.parse({ kind: "part", sku, quantityPerMotor });

/** The designs the demo builds go on. */
export interface DemoDesigns {
  outrunner: { id: number; released: number };
  servo: { id: number; released: number };
}

export async function seedDemoDesigns(
  purchasing: DemoPurchasing,
): Promise<DemoDesigns> {
  const builderId = demoPersonId("builder");

  // A 12-slot, 14-pole outrunner on the catalogue's Ø60 × 30 mm stack, one tooth coil per tooth.
  const outrunner = await createDesign(
    newDesignSchema.parse({
      name: "Kestrel 60-30 outrunner",
      motorType: "Outrunner, 12 slots / 14 poles",
      description:
        "Small external-rotor motor for light traction drives (carts, conveyors): 14 N42SH blocks bonded in a steel bell, concentrated tooth coils wound two in hand.",
      poles: 14,
      slots: 12,
      ratedCurrentA: 6,
      ratedTorqueNm: 1.25,
      torqueBasis: "measured",
      insulationClassC: 155,
      slotAreaMm2: 38,
      coilSidesPerSlot: 2,
      phases: 3,
      windingLayers: 2,
      phaseConnection: "star",
      parallelPaths: 1,
      ratedSpeedRpm: 1500,
      airGapRadiusMm: 30.4,
      airGapFluxDensityT: 0.82,
      poleCoverage: 0.83,
      notes:
        "Rated torque from the dynamometer run on prototype P3 at 6 A RMS per phase (sinusoidal drive), winding at 120 °C.",
    }),
    builderId,
  );
  const outrunnerLines = (turns: number, endTurnMm: number, leadMm: number) => [
    coil("CU-IEC-0500", {
      turns,
      strandsInHand: 2,
      activeLengthMm: 31,
      endTurnLengthMm: endTurnMm,
      leadLengthMm: leadMm,
      coilsPerMotor: 12,
    }),
    magnet("MG-N42SH-B30124", 14, 100),
    part("PT-LAM-12S60", 1),
    part("PT-BRG-6001", 2),
    part("PT-SHAFT-8", 1),
    part("PT-SLV-PTFE", 0.3),
    part("PT-VARNISH", 0.04),
  ];
  // Lines are checked one by one (designLineSchema). The whole-revision update schema is
  // not used for a lines-only change: it would also set notes and coil sides per slot
  // back to their defaults.
  await updateDraftRevision(outrunner.id, 1, {
    lines: outrunnerLines(18, 11, 80),
  });
  await releaseRevision(outrunner.id, 1, builderId);
  // Revision 2: a trial with needle winding, one turn more and tighter end turns.
  const trial = await startNewRevision(outrunner.id);
  await updateDraftRevision(outrunner.id, trial.revision, {
    ...revisionFieldsSchema
      .pick({ ratedTorqueNm: true, torqueBasis: true, notes: true })
      .parse({
        ratedTorqueNm: 1.32,
        torqueBasis: "estimated",
        notes:
          "Trial: needle-wound, 19 turns, end turns 9 mm instead of 11 mm, leads 60 mm. Torque scaled from revision 1 until the prototype is measured.",
      }),
    lines: outrunnerLines(19, 9, 60),
  });

  // A 12-slot, 10-pole inner-rotor servo: N38UH arcs on the rotor, parts from Corbel.
  const servo = await createDesign(
    newDesignSchema.parse({
      name: "Harrier 90 servo",
      motorType: "Inner rotor servo, 12 slots / 10 poles",
      description:
        "Compact servo for a small machine-tool axis: 10 N38UH arcs on the rotor, tooth coils of 0.80 mm wire, Ø90 × 25 mm stator in an 86 mm flange housing.",
      poles: 10,
      slots: 12,
      ratedCurrentA: 5.5,
      ratedTorqueNm: 2.2,
      torqueBasis: "estimated",
      insulationClassC: 155,
      slotAreaMm2: 95,
      coilSidesPerSlot: 2,
      phases: 3,
      windingLayers: 2,
      phaseConnection: "star",
      parallelPaths: 1,
      ratedSpeedRpm: 3000,
      airGapRadiusMm: 28.3,
      airGapFluxDensityT: 0.86,
      poleCoverage: 0.83,
      notes:
        "Rated torque estimated from the first-order figure less about 15 % for slotting and leakage; measure on the first batch.",
    }),
    builderId,
  );
  const parts = purchasing.corbelSku;
  await updateDraftRevision(servo.id, 1, {
    lines: [
      coil("CU-IEC-0800", {
        turns: 38,
        strandsInHand: 1,
        activeLengthMm: 25,
        endTurnLengthMm: 16,
        leadLengthMm: 120,
        coilsPerMotor: 12,
      }),
      magnet("MG-N38UH-A28", 10, 120),
      part(parts.lamination, 1),
      part(parts.housing, 1),
      part(parts.shaft, 1),
      part(parts.bearing, 2),
      part(parts.wedge, 12),
      part(parts.liner, 12),
      part(parts.leadWire, 0.9),
    ],
  });
  await releaseRevision(servo.id, 1, builderId);

  // A moving-coil actuator: the whole winding sits in the gap, so there are no end turns.
  const actuator = await createDesign(
    newDesignSchema.parse({
      name: "Wren 22 moving-coil actuator",
      motorType: "Linear moving-coil actuator",
      description:
        "Short-stroke actuator for a valve: a round coil moving between two N45SH rings. Every turn lies in the field.",
      poles: 2,
      slots: 1,
      ratedCurrentA: 0.6,
      torqueBasis: "estimated",
      insulationClassC: 130,
      coilSidesPerSlot: 1,
      // One coil driven by one current: no polyphase winding, so no winding factor.
      phases: 1,
      windingLayers: 1,
      phaseConnection: "star",
      parallelPaths: 1,
      notes:
        "Draft. A linear actuator gives force, not torque: the rated torque is left empty. Active length per side is half the mean turn (Ø22 mm coil).",
    }),
    builderId,
  );
  await updateDraftRevision(actuator.id, 1, {
    lines: [
      coil(
        "CU-AWG-AWG30",
        {
          turns: 180,
          strandsInHand: 1,
          activeLengthMm: 34.6,
          endTurnLengthMm: 0,
          leadLengthMm: 200,
          coilsPerMotor: 1,
        },
        90,
      ),
      magnet("MG-N45SH-R2210", 2, 80),
      part(parts.leadWire, 0.4),
    ],
  });

  return {
    outrunner: { id: outrunner.id, released: 1 },
    servo: { id: servo.id, released: 1 },
  };
}
