import { describe, expect, it } from "vitest";
import {
  oneTimeLinkNote,
  textForOutbox,
  textToSend,
  textWithoutLink,
  waitingLinkNote,
} from "./one-time-link";

const link = "http://x/set-password?token=abcDEF123_-";
const text = `Hello Ana,\n\nChoose your password here:\n\n${link}\n\nBye.`;

describe("one-time links in the outbox", () => {
  it("are stored as a note and put back only in what is sent", () => {
    const stored = textWithoutLink(text, link);
    expect(stored).not.toContain("token=");
    expect(stored).toBe(
      `Hello Ana,\n\nChoose your password here:\n\n${oneTimeLinkNote}\n\nBye.`,
    );
    expect(textToSend(stored, link)).toBe(text);
    // Once sent, the link is gone and the stored text is what is left.
    expect(textToSend(stored, null)).toBe(stored);
  });

  it("show admins a note that says whether the link is still to go", () => {
    const stored = textWithoutLink(text, link);
    expect(textForOutbox(stored, false)).toContain(waitingLinkNote);
    expect(textForOutbox(stored, false)).not.toContain(link);
    expect(textForOutbox(stored, true)).toContain(oneTimeLinkNote);
    expect(textForOutbox("No link here.", false)).toBe("No link here.");
  });

  it("refuse a link the text does not carry (it would be sent to nobody)", () => {
    expect(() => textWithoutLink(text, "http://x/other")).toThrow();
    expect(() => textWithoutLink(text, "")).toThrow();
  });
});
