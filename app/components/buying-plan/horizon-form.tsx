/** The plan's horizon (weeks ahead) and the item whose chart is shown: a GET form, so the address says what is shown. */
import { Form } from "react-router";
import { planHorizon } from "~/buying-plan/plan-weeks";

const choices = [2, 4, 6, 8, 12, 16, 20, 26];

export function HorizonForm({
  weeks,
  item,
}: {
  weeks: number;
  item: string | null;
}) {
  const options = [...new Set([...choices, weeks])].sort((a, b) => a - b);
  return (
    <Form
      method="get"
      className="panel flex flex-wrap items-end gap-4 py-4"
      aria-label="Choose the horizon"
    >
      <div className="w-44">
        <label htmlFor="plan-weeks" className="field-label">
          Weeks ahead
        </label>
        <select
          id="plan-weeks"
          name="weeks"
          defaultValue={String(weeks)}
          className="field-input"
        >
          {options.map((count) => (
            <option key={count} value={count}>
              {count} {count === 1 ? "week" : "weeks"}
            </option>
          ))}
        </select>
      </div>
      {item ? <input type="hidden" name="item" value={item} /> : null}
      <button type="submit" className="button-quiet">
        Show plan
      </button>
      <p className="text-sm text-graphite-500">
        {planHorizon.min} to {planHorizon.max} weeks; weeks start on Monday, the
        first is this week.
      </p>
    </Form>
  );
}
