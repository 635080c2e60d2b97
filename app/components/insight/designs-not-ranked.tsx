import type { DesignInsight } from "~/insight/design-insight.server";
import { costingMoneyText, unpricedText } from "~/insight/design-insight";
import { designLabel } from "./design-insight-text";

/**
 * The designs the ranking leaves out, set apart below the chart: with lines unpriced
 * their cost is too low to compare; without a torque there is no cost per N·m.
 */
export function DesignsNotRanked({
  incomplete,
  withoutTorque,
  currency,
}: {
  incomplete: DesignInsight[];
  withoutTorque: DesignInsight[];
  currency: string;
}) {
  if (incomplete.length === 0 && withoutTorque.length === 0) return null;
  return (
    <div className="mt-3 border-t border-rule pt-2 text-sm">
      <h4 className="text-xs font-semibold tracking-wide text-graphite-500 uppercase">
        Not ranked
      </h4>
      <ul aria-label="Designs not ranked" className="mt-1 space-y-1">
        {incomplete.map((design) => (
          <li key={design.designId}>
            <span className="font-medium">{designLabel(design)}</span>:{" "}
            <span className="text-caution">
              {unpricedText(design.unpriced.length)}
            </span>
            <span className="text-graphite-500">
              {" "}
              (the priced lines alone:{" "}
              {costingMoneyText(design.costPerMotor, currency)} per motor)
            </span>
          </li>
        ))}
        {withoutTorque.map((design) => (
          <li key={design.designId}>
            <span className="font-medium">{designLabel(design)}</span>:{" "}
            <span className="text-graphite-500">
              no rated torque and no estimate, so no cost per N·m
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
