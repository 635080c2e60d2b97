/** Reading what went through the SMTP fake. */
import { inject } from "vitest";

export interface ReceivedMessage {
  to: string[];
  from: string;
  subject: string;
  text: string;
  /** Files sent with the message, their bytes in base64. */
  attachments: {
    fileName: string;
    contentType: string;
    contentBase64: string;
  }[];
  receivedAt: string;
}

export async function receivedMessages(): Promise<ReceivedMessage[]> {
  const response = await fetch(`${inject("mailFakeUrl")}/messages`);
  return (await response.json()) as ReceivedMessage[];
}

/** Waits (briefly) for a message to an address whose subject matches. */
export async function waitForMessage(
  to: string,
  subject: RegExp,
  timeoutMs = 10_000,
): Promise<ReceivedMessage> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const found = (await receivedMessages()).find(
      (message) => message.to.includes(to) && subject.test(message.subject),
    );
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(
    `no message to ${to} matching ${subject} within ${timeoutMs} ms`,
  );
}

/** The first https?:// link in a message's text. */
export function linkIn(message: ReceivedMessage): string {
  const match = message.text.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`no link in message "${message.subject}"`);
  return match[0];
}

/** Makes the SMTP fake refuse recipients whose address contains one of the texts (421), until lifted. */
export async function refuseRecipients(texts: string[]): Promise<void> {
  const response = await fetch(`${inject("mailFakeUrl")}/refusals`, {
    method: texts.length === 0 ? "DELETE" : "PUT",
    body: texts.length === 0 ? undefined : JSON.stringify(texts),
  });
  if (!response.ok) throw new Error(`refusals: ${response.status}`);
}
