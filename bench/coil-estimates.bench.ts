/**
 * Coil estimate speed: the pure module (10,000 estimates per batch, target
 * under 50 ms) and the API (one estimate per request, target median server
 * time under 5 ms, read from the Server-Timing header).
 */
import {
  estimateCoil,
  type CoilEstimateInput,
} from "~/engineering/coil-estimate";
import { IEC_NOMINAL_DIAMETERS } from "~/engineering/reference-data";
import { summarise } from "./statistics";

export interface Figure {
  name: string;
  unit: string;
  target: string;
  passed: boolean;
  median: number;
  p95: number;
  samples: number[];
  /** What the figure (or its raw baseline) measures, when the name does not say it all. */
  note?: string;
}

function coilInputs(count: number): CoilEstimateInput[] {
  const inputs: CoilEstimateInput[] = [];
  for (let index = 0; index < count; index += 1) {
    const awg = index % 2 === 0;
    inputs.push({
      conductor: index % 5 === 0 ? "aluminium" : "copper",
      wire: awg
        ? { standard: "AWG", size: String(10 + (index % 30)) }
        : {
            standard: "IEC",
            diameterMm: IEC_NOMINAL_DIAMETERS[20 + (index % 60)]!.diameterMm,
          },
      insulation: awg ? "heavy" : "grade2",
      turns: 10 + (index % 200),
      strandsInHand: 1 + (index % 3),
      activeLengthMm: 20 + (index % 80),
      endTurnLengthMm: 10 + (index % 40),
      leadLengthMm: 100,
      coilCount: 12,
      temperatureC: 20 + (index % 130),
      scrapPercent: 3,
      currentA: 10,
    });
  }
  return inputs;
}

export function benchPureCoilEstimates(batches = 30): Figure {
  const inputs = coilInputs(10_000);
  for (const input of inputs.slice(0, 2_000)) estimateCoil(input); // warm up the JIT
  const samples: number[] = [];
  let checksum = 0;
  for (let batch = 0; batch < batches; batch += 1) {
    const started = performance.now();
    for (const input of inputs)
      checksum += estimateCoil(input).perCoil.resistanceOhm;
    samples.push(performance.now() - started);
  }
  if (!Number.isFinite(checksum))
    throw new Error("a coil estimate was not finite");
  const summary = summarise(samples);
  return {
    name: "10,000 coil estimates, pure module",
    unit: "ms per batch",
    target: "median < 50 ms",
    passed: summary.median < 50,
    median: summary.median,
    p95: summary.p95,
    samples,
  };
}

export async function benchCoilEstimateApi(
  baseUrl: string,
  cookie: string,
  requests = 400,
): Promise<Figure> {
  const body = JSON.stringify({
    conductor: "copper",
    wire: { standard: "IEC", diameterMm: 0.8 },
    insulation: "grade2",
    turns: 40,
    activeLengthMm: 50,
    endTurnLengthMm: 30,
    leadLengthMm: 150,
    coilCount: 12,
    temperatureC: 120,
    scrapPercent: 3,
    currentA: 10,
  });
  const samples: number[] = [];
  for (let index = 0; index < requests + 50; index += 1) {
    const response = await fetch(`${baseUrl}/api/v1/coil-estimates`, {
      method: "POST",
      headers: { "Content-Type": "application/json", Cookie: cookie },
      body,
    });
    await response.arrayBuffer();
    if (response.status !== 200)
      throw new Error(`coil estimate answered ${response.status}`);
    const timing = response.headers
      .get("Server-Timing")
      ?.match(/dur=([\d.]+)/)?.[1];
    if (!timing) throw new Error("no Server-Timing header");
    if (index >= 50) samples.push(Number(timing)); // the first 50 warm up
  }
  const summary = summarise(samples);
  return {
    name: "POST /api/v1/coil-estimates, server time",
    unit: "ms per request",
    target: "median < 5 ms",
    passed: summary.median < 5,
    median: summary.median,
    p95: summary.p95,
    samples,
  };
}
