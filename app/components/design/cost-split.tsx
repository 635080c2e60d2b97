import { formatQuantity } from "~/lib/format";
import { TableScroll } from "~/components/table-scroll";

export interface DesignCostSplitValues {
  activeCopper: number;
  endTurnCopper: number;
  leadsAndScrap: number;
  magnets: number;
  parts: number;
}

/** Each part of the money with its own colour AND pattern, so the bar reads without colour too. */
const parts = [
  {
    key: "activeCopper",
    label: "Active copper",
    detail: "coil sides in the field: the copper that makes torque",
    className: "bg-field",
  },
  {
    key: "endTurnCopper",
    label: "End-turn copper",
    detail: "the overhangs: length, loss and cost, no torque",
    className:
      "bg-copper-500 bg-[repeating-linear-gradient(135deg,transparent_0_4px,rgba(255,255,255,0.5)_4px_7px)]",
  },
  {
    key: "leadsAndScrap",
    label: "Leads and scrap",
    detail: "leads, start-up and cut-offs",
    className:
      "bg-graphite-300 bg-[repeating-linear-gradient(90deg,transparent_0_3px,rgba(255,255,255,0.7)_3px_5px)]",
  },
  {
    key: "magnets",
    label: "Magnets",
    detail: "",
    className:
      "bg-graphite-700 bg-[radial-gradient(rgba(255,255,255,0.55)_1.2px,transparent_1.4px)] bg-size-[6px_6px]",
  },
  {
    key: "parts",
    label: "Other parts",
    detail: "",
    className:
      "bg-copper-100 bg-[repeating-linear-gradient(45deg,transparent_0_3px,rgba(57,65,75,0.35)_3px_4px),repeating-linear-gradient(-45deg,transparent_0_3px,rgba(57,65,75,0.35)_3px_4px)]",
  },
] as const;

/**
 * Where the money of one motor goes: a bar with a pattern per part and a list
 * with every amount, its share and its name beside the same pattern.
 */
export function DesignCostSplit({
  split,
  currency,
  id = "cost-split",
}: {
  split: DesignCostSplitValues;
  currency: string;
  id?: string;
}) {
  const total = parts.reduce((sum, part) => sum + split[part.key], 0);
  return (
    <figure aria-labelledby={`${id}-caption`} className="space-y-3">
      <figcaption id={`${id}-caption`} className="text-sm font-semibold">
        Where the money of one motor goes
      </figcaption>
      {total > 0 ? (
        <div
          className="flex h-7 overflow-hidden rounded border border-graphite-300 print:[print-color-adjust:exact]"
          aria-hidden="true"
        >
          {parts.map((part) =>
            split[part.key] > 0 ? (
              <div
                key={part.key}
                title={`${part.label}: ${formatQuantity(split[part.key], currency, 2)}`}
                className={`${part.className} border-r border-white last:border-r-0`}
                style={{ width: `${(split[part.key] / total) * 100}%` }}
              />
            ) : null,
          )}
        </div>
      ) : (
        <p className="text-sm text-graphite-500">
          No priced line yet: the split appears once a line has a price.
        </p>
      )}
      <TableScroll
        label={`Cost of one motor by part, in ${currency}`}
        className="max-w-xl"
      >
        <table className="data-table">
          <caption className="sr-only">
            Cost of one motor by part, in {currency}
          </caption>
          <thead>
            <tr>
              <th scope="col">Part</th>
              <th scope="col" className="text-right">
                Per motor
              </th>
              <th scope="col" className="text-right">
                Share
              </th>
            </tr>
          </thead>
          <tbody>
            {parts.map((part) => (
              <tr key={part.key}>
                <th scope="row" className="font-normal">
                  <span className="inline-flex items-start gap-2">
                    <span
                      aria-hidden="true"
                      className={`mt-0.5 inline-block h-4 w-6 shrink-0 rounded-sm border border-graphite-300 ${part.className} print:[print-color-adjust:exact]`}
                    />
                    <span>
                      <span className="font-medium">{part.label}</span>
                      {part.detail ? (
                        <span className="block text-xs text-graphite-500">
                          {part.detail}
                        </span>
                      ) : null}
                    </span>
                  </span>
                </th>
                <td className="text-right">
                  {formatQuantity(split[part.key], currency, 2)}
                </td>
                <td className="text-right">
                  {total > 0
                    ? formatQuantity((split[part.key] / total) * 100, "%", 1)
                    : "—"}
                </td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" className="text-left">
                Cost per motor
              </th>
              <td className="text-right font-semibold">
                {formatQuantity(total, currency, 2)}
              </td>
              <td />
            </tr>
          </tfoot>
        </table>
      </TableScroll>
    </figure>
  );
}
