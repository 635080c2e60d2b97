/** The plan's suggestions as a table, with checkboxes for whoever may turn them into draft orders. */
import type { SuggestionJson } from "~/buying-plan/plan-json";
import { DataTable } from "~/components/data-table";
import { countText } from "~/lib/unit-text";
import {
  DraftOrdersForm,
  draftOrdersFormId,
  type DraftOrdersAnswer,
} from "./draft-orders-form";
import { suggestionColumns } from "./suggestion-columns";

export function SuggestionsPanel({
  suggestions,
  weeks,
  canOrder,
  answer,
}: {
  suggestions: SuggestionJson[];
  weeks: number;
  canOrder: boolean;
  answer: DraftOrdersAnswer | null;
}) {
  const ordering = canOrder && suggestions.length > 0;
  const late = suggestions.filter((suggestion) => suggestion.late).length;
  return (
    <section aria-labelledby="suggestions-heading" className="space-y-3">
      <div>
        <h2 id="suggestions-heading" className="text-lg font-semibold">
          Suggested orders
        </h2>
        <p className="text-sm text-graphite-500">
          {suggestions.length === 0
            ? "Nothing to buy in this horizon."
            : `${countText(suggestions.length, "suggestion")}, earliest order-by day first${late > 0 ? `; ${late} should have been ordered already` : ""}.`}
        </p>
      </div>
      <DataTable
        caption="Suggested orders, earliest order-by day first"
        columns={suggestionColumns(ordering ? draftOrdersFormId : null)}
        rows={suggestions}
        emptyText="No suggestion: the stock and open orders cover every week."
      />
      {ordering || answer ? (
        <DraftOrdersForm weeks={weeks} answer={answer} />
      ) : null}
    </section>
  );
}
