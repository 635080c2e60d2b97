import { describe, expect, it } from "vitest";
import { invitationMessage, passwordResetMessage } from "./account-messages";

describe("account e-mails", () => {
  it("carry the link and say how long it works", () => {
    const invitation = invitationMessage({
      name: "Ana",
      invitedBy: "Maren",
      link: "http://x/set-password?token=abc",
    });
    expect(invitation.text).toContain("http://x/set-password?token=abc");
    expect(invitation.text).toContain("7 days");
    // Named, so the mailer keeps it out of the outbox (one-time-link.ts).
    expect(invitation.oneTimeLink).toBe("http://x/set-password?token=abc");
    const reset = passwordResetMessage({
      name: "Ana",
      link: "http://x/set-password?token=def",
    });
    expect(reset.text).toContain("http://x/set-password?token=def");
    expect(reset.text).toContain("30 minutes");
    expect(reset.oneTimeLink).toBe("http://x/set-password?token=def");
  });
});
