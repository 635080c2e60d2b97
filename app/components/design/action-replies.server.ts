/**
 * How the design page's action answers its fetchers: a change made (with the one-time
 * message the shell then shows), or a refusal of the data layer shown beside its field.
 */
import type { Submission } from "@conform-to/react";
import { data } from "react-router";
import type { DesignActionAnswer } from "~/components/design/action-answer";
import { lineIndexOfField, type DesignPageIntent } from "~/designs/design-page";
import { findRevision } from "~/designs/design-revisions.server";
import { isDomainError } from "~/lib/domain-error";
import { flashHeaders } from "~/lib/flash.server";
import type { FlashNote } from "~/lib/flash-messages";

export type { DesignActionAnswer };

type Answer = DesignActionAnswer;
export const answer = (body: Answer, status = 200) => data(body, { status });
/** A change made: the answer for the fetcher, and the one-time message the shell then shows. */
export const doneAnswer = async (body: Answer, note: FlashNote) =>
  data(body, { headers: await flashHeaders(note) });

/** The row id of a revision, which messages about it name. */
export async function revisionRowId(designId: number, revision: number) {
  const found = await findRevision(designId, revision);
  return found?.revision.id ?? null;
}

/** A refusal of the data layer (released, unknown item …) as the form shows it; other errors go on. */
export function refusal(
  intent: DesignPageIntent,
  submission: Submission<unknown>,
  error: unknown,
  lineIndex: number | null = null,
) {
  if (!isDomainError(error)) throw error;
  const index = lineIndexOfField(error.field);
  const field =
    index !== null
      ? index === lineIndex
        ? error.field?.replace(/^lines\[\d+\]\./, "")
        : undefined
      : error.field;
  return answer(
    {
      intent,
      ok: false,
      message: error.message,
      result: submission.reply(
        field
          ? { fieldErrors: { [field]: [error.message] } }
          : { formErrors: [error.message] },
      ),
    },
    error.status,
  );
}

/** A message for a change the page could not make at all (no form to show it beside). */
export function plainRefusal(intent: DesignPageIntent, error: unknown) {
  if (!isDomainError(error)) throw error;
  return answer({ intent, ok: false, message: error.message }, error.status);
}

export const changedMeanwhile =
  "This line was changed or removed meanwhile (another save of this revision). The page now shows the lines as they are: make the change again.";
