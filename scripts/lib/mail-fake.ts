/**
 * The local SMTP fake for development and tests: a real SMTP server (the
 * smtp-server package) on 127.0.0.1 that keeps every message it accepts, and
 * a small HTTP endpoint that lists them (attachments with their bytes in
 * base64), so tests read what truly went through SMTP. It delivers nothing
 * anywhere.
 *
 * Tests can make it refuse some recipients, as a server that is down would
 * (421 "service not available"): PUT /refusals ["text in the address", …];
 * DELETE /refusals lifts them. Other recipients are not affected, so tests
 * running at the same time keep their mail.
 */
import http from "node:http";
import type { AddressInfo } from "node:net";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface ReceivedAttachment {
  fileName: string;
  contentType: string;
  contentBase64: string;
}

export interface ReceivedMessage {
  to: string[];
  from: string;
  subject: string;
  text: string;
  attachments: ReceivedAttachment[];
  receivedAt: string;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  messages: ReceivedMessage[];
  close(): Promise<void>;
}

function addressesOf(value: unknown): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((entry: { value?: { address?: string }[] }) =>
    (entry.value ?? []).map((address) => address.address ?? "").filter(Boolean),
  );
}

export async function startMailFake(options: {
  smtpPort: number;
  httpPort: number;
  quiet?: boolean;
}): Promise<MailFake> {
  const messages: ReceivedMessage[] = [];
  let refusals: string[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    banner: "Turnledger mail fake",
    logger: false,
    size: 10 * 1024 * 1024,
    onRcptTo(address, _session, callback) {
      if (refusals.some((text) => address.address.includes(text))) {
        const refused = new Error(
          "Service not available (the mail fake was told to refuse this recipient)",
        ) as Error & { responseCode: number };
        refused.responseCode = 421;
        callback(refused);
        return;
      }
      callback();
    },
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const message: ReceivedMessage = {
            to: addressesOf(parsed.to),
            from: addressesOf(parsed.from)[0] ?? "",
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            attachments: parsed.attachments.map((attachment) => ({
              fileName: attachment.filename ?? "",
              contentType: attachment.contentType,
              contentBase64: attachment.content.toString("base64"),
            })),
            receivedAt: new Date().toISOString(),
          };
          messages.unshift(message);
          if (messages.length > 5_000) messages.length = 5_000;
          if (!options.quiet) {
            console.log(
              `[mail fake] to ${message.to.join(", ")}: ${message.subject}`,
            );
          }
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(options.smtpPort, "127.0.0.1", () => resolve());
  });

  const api = http.createServer((request, response) => {
    if (request.url?.startsWith("/refusals")) {
      if (request.method === "DELETE") {
        refusals = [];
        response.writeHead(204).end();
        return;
      }
      let body = "";
      request.on("data", (chunk: Buffer) => (body += chunk.toString()));
      request.on("end", () => {
        try {
          const parsed = JSON.parse(body) as unknown;
          if (
            !Array.isArray(parsed) ||
            !parsed.every((entry) => typeof entry === "string" && entry)
          )
            throw new Error("not a list of texts");
          refusals = parsed;
          response.writeHead(204).end();
        } catch {
          response.writeHead(400, { "Content-Type": "application/json" });
          response.end(JSON.stringify({ error: "PUT a JSON list of texts" }));
        }
      });
      return;
    }
    if (request.url?.startsWith("/messages")) {
      if (request.method === "DELETE") {
        messages.length = 0;
        response.writeHead(204).end();
        return;
      }
      response.writeHead(200, { "Content-Type": "application/json" });
      response.end(JSON.stringify(messages));
      return;
    }
    response.writeHead(404, { "Content-Type": "application/json" });
    response.end(JSON.stringify({ error: "GET or DELETE /messages" }));
  });
  await new Promise<void>((resolve, reject) => {
    api.once("error", reject);
    api.listen(options.httpPort, "127.0.0.1", () => resolve());
  });

  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    httpPort: (api.address() as AddressInfo).port,
    messages,
    close: () =>
      Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        new Promise<void>((resolve) => api.close(() => resolve())),
      ]).then(() => undefined),
  };
}
