import { describe, expect, it } from "vitest";
import { postedAnswerMessages } from "./posted-answer-messages";

describe("the messages of an answer to a plain form post", () => {
  it("shows the answer's own message alone", () => {
    expect(
      postedAnswerMessages({
        intent: "release",
        ok: true,
        message: "Revision 2 is released: it is read-only from now on.",
        result: { status: "error", error: { poles: ["ignored"] } },
      }),
    ).toEqual(["Revision 2 is released: it is read-only from now on."]);
  });

  it("names each field message by its field, and leaves form messages unnamed", () => {
    expect(
      postedAnswerMessages({
        intent: "fields",
        ok: false,
        result: {
          status: "error",
          error: {
            "": ["Nothing could be saved."],
            poles: ["A motor has an even number of poles."],
            slots: ["The slot count must be at least 1.", "Second."],
            notes: null,
          },
        },
      }),
    ).toEqual([
      "Nothing could be saved.",
      "poles: A motor has an even number of poles.",
      "slots: The slot count must be at least 1.",
      "slots: Second.",
    ]);
  });

  it("has nothing to show for an answer without message or errors", () => {
    expect(postedAnswerMessages({ intent: "fields", ok: true })).toEqual([]);
    expect(
      postedAnswerMessages({
        intent: "fields",
        ok: true,
        result: { status: "success" },
      }),
    ).toEqual([]);
  });
});
