/**
 * The one mailer. Every message is written to the outbox table first, then
 * handed to SMTP; a message the SMTP server did not accept stays unsent and
 * `npm run mail:retry` sends it later. Sending never throws to the caller.
 * A message's one-time link is stored apart from its text and dropped once
 * SMTP has taken it (app/mail/one-time-link.ts). Files sent with a message (a
 * purchase order's PDF and CSV) are kept with it in mail_attachments, so a
 * retry sends the same files and the admin's outbox names them.
 */
import { and, asc, eq, isNull, lt } from "drizzle-orm";
import nodemailer, { type Transporter } from "nodemailer";
import { db, type Database, type Transaction } from "~/db/client.server";
import { mailAttachments, mailOutbox } from "~/db/schema";
import { retryWriteConflicts } from "~/db/write-transaction.server";
import { areaLogger } from "~/observability/logger.server";
import { textToSend, textWithoutLink } from "./one-time-link";

const mailLog = areaLogger("mail");

export const defaultSmtpUrl = "smtp://127.0.0.1:2525";

let transporter: Transporter | undefined;
function smtp(): Transporter {
  const url = new URL(process.env.SMTP_URL || defaultSmtpUrl);
  transporter ??= nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (url.protocol === "smtps:" ? 465 : 587)),
    secure: url.protocol === "smtps:",
    auth: url.username
      ? {
          user: decodeURIComponent(url.username),
          pass: decodeURIComponent(url.password),
        }
      : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return transporter;
}

const fromAddress = () =>
  process.env.MAIL_FROM || "Turnledger <no-reply@turnledger.test>";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** A link that must reach the recipient only (it appears in `text`). */
  oneTimeLink?: string;
  /** Files sent with the message, kept with it in the outbox. */
  attachments?: readonly MailAttachment[];
}

export interface MailAttachment {
  fileName: string;
  contentType: string;
  content: Buffer;
}

interface QueuedMessage {
  id: number;
  toAddress: string;
  subject: string;
  textBody: string;
  oneTimeLink: string | null;
  attempts: number;
  /** Known when just queued; read from mail_attachments when undefined (a retry). */
  attachments?: readonly MailAttachment[];
}

/** The outbox row for a message: its one-time link kept apart from the text. */
function outboxRow(mail: OutgoingMail) {
  return {
    toAddress: mail.to,
    subject: mail.subject,
    textBody: mail.oneTimeLink
      ? textWithoutLink(mail.text, mail.oneTimeLink)
      : mail.text,
    oneTimeLink: mail.oneTimeLink ?? null,
  };
}

/** The files kept with an outbox message, in the order they were added. */
async function storedAttachments(outboxId: number): Promise<MailAttachment[]> {
  const rows = await db
    .select({
      fileName: mailAttachments.fileName,
      contentType: mailAttachments.contentType,
      contentBase64: mailAttachments.contentBase64,
    })
    .from(mailAttachments)
    .where(eq(mailAttachments.outboxId, outboxId))
    .orderBy(asc(mailAttachments.id));
  return rows.map((row) => ({
    fileName: row.fileName,
    contentType: row.contentType,
    content: Buffer.from(row.contentBase64, "base64"),
  }));
}

/** Hands one queued message to SMTP and records the outcome on its outbox row. */
async function attemptDelivery(message: QueuedMessage): Promise<boolean> {
  const attempts = message.attempts + 1;
  try {
    const attachments =
      message.attachments ?? (await storedAttachments(message.id));
    await smtp().sendMail({
      from: fromAddress(),
      to: message.toAddress,
      subject: message.subject,
      text: textToSend(message.textBody, message.oneTimeLink),
      attachments: attachments.map((attachment) => ({
        filename: attachment.fileName,
        contentType: attachment.contentType,
        content: attachment.content,
      })),
    });
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    // The outbox id finds the address on the admin's Outbox page.
    mailLog.warn({ outboxId: message.id, reason }, "message not sent");
    await retryWriteConflicts(
      () =>
        db
          .update(mailOutbox)
          .set({ lastError: reason.slice(0, 500), attempts })
          .where(eq(mailOutbox.id, message.id)),
      { label: "outbox failure mark" },
    ).catch((markError: unknown) =>
      mailLog.error(
        { outboxId: message.id, err: markError },
        "message not sent, and its failure could not be recorded",
      ),
    );
    return false;
  }
  // Sent: the link has reached its recipient and is kept nowhere else. Retried on a
  // write conflict: a row left unsent would be sent a second time by mail:retry.
  // A mark that still fails is logged, never recorded as a failed send.
  try {
    await retryWriteConflicts(
      () =>
        db
          .update(mailOutbox)
          .set({
            sentAt: new Date(),
            lastError: null,
            attempts,
            oneTimeLink: null,
          })
          .where(eq(mailOutbox.id, message.id)),
      { label: "outbox sent mark" },
    );
  } catch (error) {
    mailLog.error(
      { outboxId: message.id, err: error },
      "message sent, but not marked sent: mail:retry would send it again",
    );
  }
  return true;
}

/** Queues a message and tries to send it at once: its outbox id, and whether SMTP accepted it. */
export async function queueMail(
  mail: OutgoingMail,
): Promise<{ outboxId: number; sent: boolean }> {
  const [queued] = await writeToOutbox(db, [mail]);
  if (!queued)
    throw new Error("The outbox did not return the new message's id.");
  const sent = await attemptDelivery(queued);
  return { outboxId: queued.id, sent };
}

/** Deliveries started by `queueMailForLater` and not yet finished. */
const deliveriesUnderWay = new Set<Promise<void>>();

/**
 * Queues messages in the outbox now and hands them to SMTP after the caller
 * has moved on (all at once, not one after another): for mail a request sends
 * on the side, such as low-stock alerts, so a slow or stopped SMTP server never
 * delays the stock work that caused it. The outbox rows exist when this
 * returns; a message SMTP does not take stays unsent for `npm run mail:retry`.
 */
export async function queueMailForLater(
  mails: readonly OutgoingMail[],
): Promise<number[]> {
  const queued = await writeToOutbox(db, mails);
  deliverLater(queued);
  return queued.map((message) => message.id);
}

/** Messages written to the outbox and not yet handed to SMTP (see `writeToOutbox`). */
export type OutboxMessages = readonly QueuedMessage[];

/**
 * Writes messages to the outbox, one row each (one statement per row, so each id is
 * the one MariaDB gave that row, whatever `auto_increment_increment` is), in the
 * caller's transaction when given one. Hand them to `deliverLater` only once that
 * transaction has committed: a transaction that is rolled back and retried must not
 * have sent anything.
 */
export async function writeToOutbox(
  writer: Database | Transaction,
  mails: readonly OutgoingMail[],
): Promise<OutboxMessages> {
  const queued: QueuedMessage[] = [];
  for (const mail of mails) {
    const message = outboxRow(mail);
    const [inserted] = await writer
      .insert(mailOutbox)
      .values(message)
      .$returningId();
    if (!inserted)
      throw new Error("The outbox did not return the new message's id.");
    const attachments = mail.attachments ?? [];
    for (const attachment of attachments) {
      await writer.insert(mailAttachments).values({
        outboxId: inserted.id,
        fileName: attachment.fileName,
        contentType: attachment.contentType,
        contentBase64: attachment.content.toString("base64"),
        byteSize: attachment.content.length,
      });
    }
    queued.push({ ...message, id: inserted.id, attempts: 0, attachments });
  }
  return queued;
}

/** Hands committed outbox messages to SMTP after the caller has moved on (all at once). */
export function deliverLater(queued: OutboxMessages): void {
  if (queued.length === 0) return;
  const delivery = Promise.all(queued.map(attemptDelivery)).then(
    () => undefined,
    (error: unknown) => mailLog.error({ err: error }, "delivery failed"),
  );
  deliveriesUnderWay.add(delivery);
  void delivery.finally(() => deliveriesUnderWay.delete(delivery));
}

/**
 * Work a request starts and does not wait for (it is done after the answer):
 * tracked with the deliveries, so `deliveriesFinished` waits for it too, and
 * a failure is logged, never thrown at a caller that has gone.
 */
export function afterTheAnswer(work: Promise<unknown>): void {
  const tracked = work.then(
    () => undefined,
    (error: unknown) =>
      mailLog.error({ err: error }, "work after an answer failed"),
  );
  deliveriesUnderWay.add(tracked);
  void tracked.finally(() => deliveriesUnderWay.delete(tracked));
}

/** Waits until every delivery `queueMailForLater` started (and all work `afterTheAnswer` was given) has been tried (scripts, before they close the database). */
export async function deliveriesFinished(): Promise<void> {
  while (deliveriesUnderWay.size > 0)
    await Promise.all([...deliveriesUnderWay]);
}

/** Queues a message and tries to send it at once. Returns true when SMTP accepted it. */
export async function sendMail(mail: OutgoingMail): Promise<boolean> {
  return (await queueMail(mail)).sent;
}

/** Tries every unsent message again, oldest first. */
export async function retryUnsentMail(
  maxMessages = 500,
): Promise<{ sent: number; failed: number }> {
  const unsent = await db
    .select()
    .from(mailOutbox)
    .where(and(isNull(mailOutbox.sentAt), lt(mailOutbox.attempts, 50)))
    .orderBy(asc(mailOutbox.createdAt))
    .limit(maxMessages);
  let sent = 0;
  for (const message of unsent) {
    if (await attemptDelivery(message)) sent += 1;
  }
  return { sent, failed: unsent.length - sent };
}
