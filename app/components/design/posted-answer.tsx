import type { DesignActionAnswer } from "./action-answer";
import { postedAnswerMessages } from "./posted-answer-messages";

/**
 * The answer to a form sent without JavaScript (the page's forms are fetchers, whose
 * answers show beside them; a plain post lands here instead).
 */
export function PostedAnswer({
  answer,
}: {
  answer: DesignActionAnswer | undefined;
}) {
  if (!answer) return null;
  const messages = postedAnswerMessages(answer);
  if (messages.length === 0) return null;
  return (
    <div
      role={answer.ok ? "status" : "alert"}
      className={`rounded-md border px-4 py-2 text-sm ${
        answer.ok
          ? "border-ok/40 bg-ok/5 text-ok"
          : "border-danger/40 bg-danger/5 text-danger"
      }`}
    >
      {answer.ok ? null : <p className="font-semibold">Nothing was changed.</p>}
      <ul>
        {messages.map((message) => (
          <li key={message}>{message}</li>
        ))}
      </ul>
    </div>
  );
}
