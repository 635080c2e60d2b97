/**
 * Where a list sorted by time, newest first, left off: the sort key (a time to the
 * millisecond) and the row's id, which breaks ties. A page after a cursor is read
 * from the list's index at that place (keyset pagination) instead of skipping
 * every earlier row (offset), so a deep page costs what the first one does.
 *
 * In the address it is written "<milliseconds since 1970>-<id>" ("1764806400123-98765"):
 * clients pass back what an answer gave them and never build one. Pure: no framework, no I/O.
 */
import { z } from "zod";

export interface KeysetCursor {
  at: Date;
  id: number;
}

const cursorText = /^(\d{1,15})-(\d{1,15})$/;

/** The cursor of a row, for the address. */
export function formatKeysetCursor(row: { at: Date; id: number }): string {
  return `${row.at.getTime()}-${row.id}`;
}

/** The cursor a text stands for; null when it is not one. */
export function parseKeysetCursor(text: string): KeysetCursor | null {
  const match = cursorText.exec(text.trim());
  if (!match) return null;
  const at = new Date(Number(match[1]));
  const id = Number(match[2]);
  if (Number.isNaN(at.getTime()) || !Number.isSafeInteger(id)) return null;
  return { at, id };
}

/** A cursor parameter of the address (`after`, `before`), refused with a message naming it. */
export function keysetCursorParam(name: string, description: string) {
  const message = `${name} must be a cursor an earlier answer gave (nextCursor or previousCursor).`;
  return z
    .string({ error: message })
    .max(40, message)
    .regex(cursorText, message)
    .transform((text, context) => {
      const cursor = parseKeysetCursor(text);
      if (!cursor) {
        context.addIssue({ code: "custom", message });
        return z.NEVER;
      }
      return cursor;
    })
    .meta({ description, example: "1764806400123-98765" });
}
