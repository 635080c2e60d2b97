import { Form } from "react-router";
import type { AlertMailMode } from "~/db/tables/alert-enums";

/** How a buyer hears about items below their reorder point: each alert, a daily digest, or not by e-mail. */
export function LowStockMailChoice({
  alertMode,
}: {
  alertMode: AlertMailMode;
}) {
  return (
    <section aria-labelledby="alerts-heading" className="space-y-3">
      <h2 id="alerts-heading" className="text-lg font-semibold">
        Low-stock e-mails
      </h2>
      <Form method="post" className="space-y-2">
        <input type="hidden" name="intent" value="alert-mode" />
        <fieldset className="space-y-1 text-sm">
          <legend className="mb-1 text-graphite-700">
            When an item falls below its reorder point, tell me:
          </legend>
          {(
            [
              ["each", "by e-mail, for each new alert"],
              ["digest", "once a day, in a digest of every open alert"],
              ["none", "not by e-mail (I read the Alerts page)"],
            ] as const
          ).map(([mode, label]) => (
            <label key={mode} className="flex items-center gap-2">
              <input
                type="radio"
                name="mode"
                value={mode}
                defaultChecked={alertMode === mode}
              />
              {label}
            </label>
          ))}
        </fieldset>
        <button type="submit" className="button-quiet">
          Save
        </button>
      </Form>
    </section>
  );
}
