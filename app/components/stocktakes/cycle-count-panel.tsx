/** The locations to count this week (cycle counting), with a button to start a stocktake of them. */
import { Form, useNavigation } from "react-router";
import { formatDay } from "~/lib/format";
import { moneyText } from "~/lib/unit-text";
import { TableScroll } from "~/components/table-scroll";

export interface PlannedLocationRow {
  code: string;
  countClass: "A" | "B" | "C";
  /** In the company currency. */
  value: number;
  lastCountedOn: string | null;
  dueOn: string | null;
}

export function CycleCountPanel({
  plan,
  currency,
  canStart,
}: {
  plan: PlannedLocationRow[];
  currency: string;
  canStart: boolean;
}) {
  const navigation = useNavigation();
  return (
    <section aria-labelledby="cycle-count-heading" className="panel space-y-3">
      <div>
        <h2 id="cycle-count-heading" className="text-lg font-semibold">
          To count this week
        </h2>
        <p className="text-sm text-graphite-500">
          Places holding most of the stock value (class A) come round about
          monthly, the next (B) quarterly, the rest (C) twice a year; never
          counted first, then the longest overdue.
        </p>
      </div>
      {plan.length === 0 ? (
        <p className="text-sm text-graphite-700">Nothing is due this week.</p>
      ) : (
        <>
          <TableScroll label="Locations due for a count this week">
            <table className="data-table">
              <caption className="sr-only">
                Locations due for a count this week
              </caption>
              <thead>
                <tr>
                  <th scope="col">Location</th>
                  <th scope="col">Class</th>
                  <th scope="col" className="text-right">
                    Stock value
                  </th>
                  <th scope="col">Last counted</th>
                  <th scope="col">Due</th>
                </tr>
              </thead>
              <tbody>
                {plan.map((location) => (
                  <tr key={location.code}>
                    <td className="font-medium">{location.code}</td>
                    <td>{location.countClass}</td>
                    <td className="text-right whitespace-nowrap">
                      {moneyText(location.value, currency)}
                    </td>
                    <td className="whitespace-nowrap">
                      {location.lastCountedOn
                        ? formatDay(location.lastCountedOn)
                        : "never"}
                    </td>
                    <td className="whitespace-nowrap">
                      {location.dueOn ? formatDay(location.dueOn) : "now"}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </TableScroll>
          {canStart ? (
            <Form method="post">
              <input type="hidden" name="intent" value="start" />
              {plan.map((location) => (
                <input
                  key={location.code}
                  type="hidden"
                  name="locations"
                  value={location.code}
                />
              ))}
              <input type="hidden" name="note" value="Cycle count" />
              <button
                type="submit"
                className="button-quiet"
                disabled={navigation.state !== "idle"}
              >
                Start a stocktake of these
              </button>
            </Form>
          ) : null}
        </>
      )}
    </section>
  );
}
