/**
 * The texts of account e-mails (invitation, password reset), each with its
 * one-time link named so the mailer keeps it out of the outbox. Pure: no I/O.
 */

export function invitationMessage(input: {
  name: string;
  invitedBy: string;
  link: string;
}): { subject: string; text: string; oneTimeLink: string } {
  return {
    subject: "You are invited to Turnledger",
    oneTimeLink: input.link,
    text: [
      `Hello ${input.name},`,
      "",
      `${input.invitedBy} has given you an account on Turnledger, where we keep our magnet wire,`,
      "magnets and motor costs. Choose your password here (the link works once, for 7 days):",
      "",
      input.link,
      "",
      "If you did not expect this, you can ignore this e-mail.",
    ].join("\n"),
  };
}

export function passwordResetMessage(input: { name: string; link: string }): {
  subject: string;
  text: string;
  oneTimeLink: string;
} {
  return {
    subject: "Choose a new Turnledger password",
    oneTimeLink: input.link,
    text: [
      `Hello ${input.name},`,
      "",
      "Someone asked to reset the password of your Turnledger account. Choose a new one here",
      "(the link works once, for 30 minutes):",
      "",
      input.link,
      "",
      "If it was not you, ignore this e-mail: your password stays as it is.",
    ].join("\n"),
  };
}
