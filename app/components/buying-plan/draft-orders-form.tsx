/** "Make draft orders": the button that turns the ticked suggestions into draft purchase orders, and what it made. */
import { Form, Link, useNavigation } from "react-router";
import { FormMessages } from "~/components/text-field";

export interface DraftOrdersAnswer {
  made: { id: number; number: string; supplier: string; lineCount: number }[];
  refused: string | null;
  errors?: string[];
}

export const draftOrdersFormId = "draft-orders";

export function DraftOrdersForm({
  weeks,
  answer,
}: {
  weeks: number;
  answer: DraftOrdersAnswer | null;
}) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  return (
    <div className="space-y-3">
      <Form
        method="post"
        id={draftOrdersFormId}
        className="flex flex-wrap items-center gap-3"
      >
        <input type="hidden" name="weeks" value={weeks} />
        <button type="submit" className="button-primary" disabled={busy}>
          Make draft orders
        </button>
        <p className="text-sm text-graphite-500">
          One draft per supplier from the ticked suggestions, priced from its
          price list; nothing is sent.
        </p>
      </Form>
      <FormMessages
        errors={[
          ...(answer?.errors ?? []),
          ...(answer?.refused ? [answer.refused] : []),
        ]}
      />
      {answer && answer.made.length > 0 ? (
        <div
          role="status"
          className="rounded-md border border-ok/40 bg-ok/5 px-3 py-2 text-sm"
        >
          <p className="font-medium text-ok">
            {answer.made.length === 1
              ? "Draft order made:"
              : `${answer.made.length} draft orders made:`}
          </p>
          <ul className="mt-1 space-y-1">
            {answer.made.map((draft) => (
              <li key={draft.id}>
                <Link
                  to={`/purchase-orders/${draft.id}`}
                  className="font-medium text-copper-700 underline underline-offset-2"
                >
                  {draft.number}
                </Link>{" "}
                {draft.supplier} ·{" "}
                {draft.lineCount === 1 ? "1 line" : `${draft.lineCount} lines`}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
