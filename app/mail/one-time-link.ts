/**
 * How a one-time link (an invitation or password-reset link) is kept in the
 * outbox. Pure: no I/O.
 *
 * The stored text holds a note where the link was; the link itself is kept
 * beside it only until SMTP has taken the message, and only the mailer puts it
 * back, into what goes to the recipient. So nobody reading the outbox (an
 * admin, a database copy) ever sees a link that works.
 */

/** Where the link was, in the stored text (and, once sent, all that is left of it). */
export const oneTimeLinkNote = "[one-time link removed after sending]";

/** What admins see in place of the link while the message still waits for SMTP. */
export const waitingLinkNote = "[one-time link, sent only to the recipient]";

/** The text to store: every copy of the link replaced by the note. */
export function textWithoutLink(text: string, link: string): string {
  if (link === "" || !text.includes(link))
    throw new Error("A one-time link must appear in its message's text.");
  return text.replaceAll(link, oneTimeLinkNote);
}

/** The text to send: the stored text with the link put back, when there is one. */
export function textToSend(storedText: string, link: string | null): string {
  return link === null
    ? storedText
    : storedText.replaceAll(oneTimeLinkNote, link);
}

/** The text an admin reads in the outbox: the note says whether the link is still to be sent. */
export function textForOutbox(storedText: string, sent: boolean): string {
  return sent
    ? storedText
    : storedText.replaceAll(oneTimeLinkNote, waitingLinkNote);
}
