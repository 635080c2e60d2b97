import {
  and,
  asc,
  count,
  desc,
  inArray,
  isNotNull,
  isNull,
  like,
  or,
} from "drizzle-orm";
import { db } from "~/db/client.server";
import { mailAttachments, mailOutbox } from "~/db/schema";
import { containsPattern } from "~/lib/list-filters";
import { textForOutbox } from "./one-time-link";

export const outboxPageSize = 50;

/**
 * The outbox newest first, a page at a time, and the number of messages in
 * all, each with the names, types and sizes of its attachments (never their
 * bytes). One-time links are never read: admins see a note in their place.
 */
export async function listOutbox(
  page: number,
  pageSize = outboxPageSize,
  filter: { search?: string; state?: "sent" | "unsent" } = {},
) {
  const where = and(
    filter.search
      ? or(
          like(mailOutbox.toAddress, containsPattern(filter.search)),
          like(mailOutbox.subject, containsPattern(filter.search)),
        )
      : undefined,
    filter.state === "unsent" ? isNull(mailOutbox.sentAt) : undefined,
    filter.state === "sent" ? isNotNull(mailOutbox.sentAt) : undefined,
  );
  const [total] = await db
    .select({ messages: count() })
    .from(mailOutbox)
    .where(where);
  const messages = await db
    .select({
      id: mailOutbox.id,
      to: mailOutbox.toAddress,
      subject: mailOutbox.subject,
      text: mailOutbox.textBody,
      createdAt: mailOutbox.createdAt,
      sentAt: mailOutbox.sentAt,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
    })
    .from(mailOutbox)
    .where(where)
    .orderBy(desc(mailOutbox.createdAt), desc(mailOutbox.id))
    .limit(pageSize)
    .offset((page - 1) * pageSize);
  const files =
    messages.length === 0
      ? []
      : await db
          .select({
            outboxId: mailAttachments.outboxId,
            fileName: mailAttachments.fileName,
            contentType: mailAttachments.contentType,
            byteSize: mailAttachments.byteSize,
          })
          .from(mailAttachments)
          .where(
            inArray(
              mailAttachments.outboxId,
              messages.map((message) => message.id),
            ),
          )
          .orderBy(asc(mailAttachments.id));
  return {
    total: total?.messages ?? 0,
    messages: messages.map((message) => ({
      ...message,
      text: textForOutbox(message.text, message.sentAt !== null),
      attachments: files
        .filter((file) => file.outboxId === message.id)
        .map(({ fileName, contentType, byteSize }) => ({
          fileName,
          contentType,
          byteSize,
        })),
    })),
  };
}
