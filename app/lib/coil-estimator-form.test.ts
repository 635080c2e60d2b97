import { parseForm } from "~/lib/parse-form";
import { describe, expect, it } from "vitest";
import {
  coilEstimatorDefaults,
  coilEstimatorFormSchema,
  coilRequestFromForm,
  formFieldOfApiField,
} from "./coil-estimator-form";
import { coilEstimateRequestSchema } from "./estimate-requests";

/** The field messages of a refused submission, none for an accepted one. */
function errorsOf(submission: ReturnType<typeof parse>) {
  return submission.status === "error" ? (submission.error ?? {}) : {};
}

function parse(values: Record<string, string>) {
  const formData = new FormData();
  for (const [name, value] of Object.entries({
    ...coilEstimatorDefaults,
    ...values,
  })) {
    formData.set(name, value);
  }
  return parseForm(formData, { schema: coilEstimatorFormSchema });
}

describe("the coil estimator's form", () => {
  it("turns the starting values into the API's round-wire request, without AC or heat", () => {
    const submission = parse({});
    expect(submission.status).toBe("success");
    if (submission.status !== "success") return;
    const request = coilRequestFromForm(submission.value);
    expect(request.wire).toEqual({ standard: "IEC", diameterMm: 0.8 });
    expect(request.frequencyHz).toBeUndefined();
    expect(request.thermal).toBeNull();
    expect(coilEstimateRequestSchema.safeParse(request).success).toBe(true);
  });

  it("asks for litz strands of the chosen size, and a frequency with layers", () => {
    const submission = parse({
      wireForm: "litz",
      iecDiameterMm: "0.100",
      insulation: "grade1",
      litzStrands: "100",
      litzBunchingSteps: "2",
      frequencyHz: "20000",
      layersPerCoil: "3",
    });
    expect(submission.status).toBe("success");
    if (submission.status !== "success") return;
    const request = coilRequestFromForm(submission.value);
    expect(request.wire).toEqual({
      standard: "litz",
      strands: 100,
      strandWire: { standard: "IEC", diameterMm: 0.1 },
      bunchingSteps: 2,
    });
    expect(request.frequencyHz).toBe(20_000);
    expect(request.layersPerCoil).toBe(3);
  });

  it("asks for flat wire's thickness and width, and refuses grade 3 for it", () => {
    const missing = parse({ wireForm: "rectangular" });
    expect(missing.status).toBe("error");
    expect(errorsOf(missing).flatThicknessMm).toEqual(["Give the thickness."]);
    const flat = parse({
      wireForm: "rectangular",
      flatThicknessMm: "2",
      flatWidthMm: "8",
      flatEdgewise: "edge",
    });
    expect(flat.status).toBe("success");
    if (flat.status === "success") {
      expect(coilRequestFromForm(flat.value).wire).toEqual({
        standard: "rectangular",
        thicknessMm: 2,
        widthMm: 8,
        edgewise: true,
      });
    }
  });

  it("sends a thermal resistance or a rise with the ambient, and refuses both at once", () => {
    const resistance = parse({ ambientC: "40", thermalResistanceKPerW: "2" });
    expect(resistance.status).toBe("success");
    if (resistance.status === "success") {
      expect(coilRequestFromForm(resistance.value).thermal).toEqual({
        ambientC: 40,
        thermalResistanceKPerW: 2,
      });
    }
    const both = parse({
      ambientC: "40",
      thermalResistanceKPerW: "2",
      temperatureRiseK: "50",
    });
    expect(errorsOf(both).temperatureRiseK?.[0]).toMatch(/either/);
    const noAmbient = parse({ temperatureRiseK: "50" });
    expect(errorsOf(noAmbient).ambientC).toEqual([
      "Give the ambient temperature.",
    ]);
  });

  it("puts the API's new field names beside the form's fields", () => {
    expect(formFieldOfApiField("wire.strands")).toBe("litzStrands");
    expect(formFieldOfApiField("wire.strandWire.diameterMm")).toBe(
      "iecDiameterMm",
    );
    expect(formFieldOfApiField("wire.thicknessMm")).toBe("flatThicknessMm");
    expect(formFieldOfApiField("thermal.thermalResistanceKPerW")).toBe(
      "thermalResistanceKPerW",
    );
    expect(formFieldOfApiField("harmonics.0.order")).toBe("frequencyHz");
    expect(formFieldOfApiField("layersPerCoil")).toBe("layersPerCoil");
  });
});

describe("flat wire without the round sizes on the form", () => {
  it("parses when the size standard and diameter are absent (they are not shown)", () => {
    const formData = new FormData();
    for (const [name, value] of Object.entries(coilEstimatorDefaults)) {
      if (name !== "standard" && name !== "iecDiameterMm" && name !== "awgSize")
        formData.set(name, value);
    }
    formData.set("wireForm", "rectangular");
    formData.set("flatThicknessMm", "2");
    formData.set("flatWidthMm", "8");
    const submission = parseForm(formData, {
      schema: coilEstimatorFormSchema,
    });
    expect(submission.status).toBe("success");
  });
});
