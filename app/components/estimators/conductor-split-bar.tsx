import type { ConductorSplit } from "~/engineering/coil-estimate";
import { formatQuantity } from "~/lib/format";

const parts = [
  { key: "activeM", label: "active sides", className: "bg-field", pattern: "" },
  {
    key: "endTurnM",
    label: "end turns",
    className: "bg-copper-500",
    pattern:
      "bg-[repeating-linear-gradient(135deg,transparent_0_4px,rgba(255,255,255,0.45)_4px_7px)]",
  },
  {
    key: "leadM",
    label: "leads",
    className: "bg-graphite-300",
    pattern:
      "bg-[repeating-linear-gradient(90deg,transparent_0_3px,rgba(255,255,255,0.6)_3px_5px)]",
  },
] as const;

/** Where a coil's conductor goes, as a bar with every part labelled (not colour alone). */
export function ConductorSplitBar({ split }: { split: ConductorSplit }) {
  const total = split.activeM + split.endTurnM + split.leadM;
  if (!(total > 0)) return null;
  return (
    <figure aria-labelledby="split-caption" className="space-y-2">
      <figcaption id="split-caption" className="text-sm font-medium">
        Where each coil&apos;s conductor goes
      </figcaption>
      <div className="flex h-5 overflow-hidden rounded" aria-hidden="true">
        {parts.map((part) =>
          split[part.key] > 0 ? (
            <div
              key={part.key}
              className={`${part.className} ${part.pattern}`}
              style={{ width: `${(split[part.key] / total) * 100}%` }}
            />
          ) : null,
        )}
      </div>
      <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
        {parts.map((part) => (
          <li key={part.key} className="inline-flex items-center gap-2">
            <span
              className={`inline-block h-3 w-3 rounded-sm ${part.className} ${part.pattern}`}
              aria-hidden="true"
            />
            {part.label}: {formatQuantity(split[part.key], "m", 3)} (
            {formatQuantity((split[part.key] / total) * 100, "%", 1)})
          </li>
        ))}
      </ul>
    </figure>
  );
}
