import { describe, expect, it } from "vitest";
import {
  magnetFormValues,
  magnetRequestOf,
  messagesOfOtherFields,
  startingMagnetInput,
  waitingForText,
} from "./magnet-estimator-form";

describe("the magnet estimator's form values", () => {
  it("writes an input as the text the fields start with, blanks for nothing given", () => {
    expect(magnetFormValues(startingMagnetInput)).toEqual({
      grade: "N42",
      shape: { kind: "block", lengthMm: "20", widthMm: "10", heightMm: "4" },
      count: "1",
      temperatureC: "20",
      br20T: "",
      magnetLengthMm: "4",
      airGapMm: "1",
      demagnetisingFieldKAm: "",
    });
  });

  it("makes the API request of a checked form, blanks as null", () => {
    expect(
      magnetRequestOf({
        shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
        count: 8,
        temperatureC: 80,
      }),
    ).toEqual({
      grade: "",
      shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
      count: 8,
      temperatureC: 80,
      br20T: null,
      magnetLengthMm: null,
      airGapMm: null,
      demagnetisingFieldKAm: null,
    });
  });
});

describe("what the estimate panel says", () => {
  const labels = { airGapMm: "air gap", "shape.heightMm": "height" };

  it("names the refused fields by their labels, or by their names", () => {
    expect(waitingForText(["shape.heightMm", "airGapMm", "odd"], labels)).toBe(
      "Waiting for a valid height, air gap, odd. The figures below are for the last complete input.",
    );
  });

  it("keeps only the API's messages for fields the form does not show", () => {
    expect(
      messagesOfOtherFields(
        {
          airGapMm: ["The air gap cannot be negative."],
          properties: ["Give either a grade or the properties."],
          shape: ["Choose a shape.", "Really."],
        },
        labels,
      ),
    ).toEqual([
      "Give either a grade or the properties.",
      "Choose a shape.",
      "Really.",
    ]);
  });
});
