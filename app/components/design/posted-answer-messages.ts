import type { DesignActionAnswer } from "./action-answer";

/**
 * The lines to show for an answer to a form sent without JavaScript: the answer's own
 * message, else every field message, named by its field ("poles: The pole count …").
 */
export function postedAnswerMessages(answer: DesignActionAnswer): string[] {
  return answer.message
    ? [answer.message]
    : Object.entries(answer.result?.error ?? {}).flatMap(([name, errors]) =>
        (errors ?? []).map((error) => (name ? `${name}: ${error}` : error)),
      );
}
