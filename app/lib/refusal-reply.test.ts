import { describe, expect, it } from "vitest";
import { refusalReply } from "./refusal-reply";

const submission = { reply: (options: object) => options };

describe("refusalReply", () => {
  it("puts the message under the field it concerns", () => {
    expect(refusalReply(submission, "quantity", "Too many.")).toEqual({
      fieldErrors: { quantity: ["Too many."] },
    });
  });

  it("puts the message above the form when no field is named", () => {
    expect(refusalReply(submission, null, "Refused.")).toEqual({
      formErrors: ["Refused."],
    });
    expect(refusalReply(submission, "", "Refused.")).toEqual({
      formErrors: ["Refused."],
    });
  });
});
