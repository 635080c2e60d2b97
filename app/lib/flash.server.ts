/**
 * The one-time message after an action, carried by a short-lived cookie from
 * the action's redirect to the next page: the action leaves a note (a code and
 * at most an id), the app shell's loader takes it once, clears the cookie in
 * the same answer and shows the words the table gives for it.
 */
import { randomUUID } from "node:crypto";
import { createCookie, redirect } from "react-router";
import { cookieIsSecure } from "~/auth/lucia.server";
import { userCan } from "./capabilities";
import type { Role } from "./roles";
import {
  flashText,
  readFlashNote,
  subjectKindOf,
  type FlashNote,
  type ShownFlash,
} from "./flash-messages";
import { flashSubjectOf } from "./flash-subjects.server";

const flashCookie = createCookie("turnledger_flash", {
  httpOnly: true,
  sameSite: "lax",
  path: "/",
  // Long enough for the redirect to be followed, short enough not to linger.
  maxAge: 60,
  secure: cookieIsSecure(),
});

/** A redirect to `url` that leaves a one-time message for the page there. */
export async function redirectWithFlash(
  url: string,
  note: FlashNote,
): Promise<Response> {
  return redirect(url, { headers: await flashHeaders(note) });
}

/**
 * The header that leaves a one-time message with an answer that is not a
 * redirect: a fetcher's answer (the count sheet, the design editor), after
 * which the client router reloads the app shell's data, which takes the
 * message. A form sent without JavaScript gets its answer rendered in the same
 * request, before the shell could read the note: such routes keep their
 * redirects wherever a plain form can reach them.
 */
export async function flashHeaders(
  note: FlashNote,
): Promise<{ "Set-Cookie": string }> {
  return { "Set-Cookie": await flashCookie.serialize(note) };
}

async function textOf(
  note: FlashNote,
  reader: { roles: readonly Role[] },
): Promise<string | null> {
  // A person's name and e-mail are for those who keep people: a note made by
  // hand about someone shows nothing to anyone else.
  if (subjectKindOf(note) === "person" && !userCan(reader, "managePeople"))
    return null;
  if (subjectKindOf(note) === "none")
    return flashText(note.code, null as never);
  const subject = await flashSubjectOf(note);
  return subject === null ? null : flashText(note.code, subject as never);
}

/**
 * Takes the request's message, if it has one: its words, and the Set-Cookie
 * that clears it, so a reload shows it no more. A cookie the app did not write
 * is cleared and shows nothing.
 */
export async function takeFlash(
  request: Request,
  reader: { roles: readonly Role[] },
): Promise<{ flash: ShownFlash | null; setCookie: string | null }> {
  const value: unknown = await flashCookie.parse(request.headers.get("Cookie"));
  if (value === null) return { flash: null, setCookie: null };
  const setCookie = await flashCookie.serialize("", { maxAge: 0 });
  const note = readFlashNote(value);
  const text = note ? await textOf(note, reader) : null;
  return { flash: text ? { text, key: randomUUID() } : null, setCookie };
}
