/** One labelled figure of a page's summary list (inside a <dl>): "On hand 12.500 kg". */
export function SummaryFigure({
  label,
  value,
  emphasis = false,
}: {
  label: string;
  value: React.ReactNode;
  emphasis?: boolean;
}) {
  return (
    <div>
      <dt className="text-xs font-medium uppercase tracking-wide text-graphite-500">
        {label}
      </dt>
      <dd className={`mt-0.5 text-lg ${emphasis ? "font-semibold" : ""}`}>
        {value}
      </dd>
    </div>
  );
}
