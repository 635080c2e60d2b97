/** The electrical caution beside a design's coils (product brief, "Cautions"). */
export function DesignInsulationCaution({
  insulationClassC,
}: {
  insulationClassC: number;
}) {
  return (
    <aside
      aria-labelledby="insulation-caution-heading"
      className="flex gap-3 rounded-lg border border-caution/50 bg-caution/5 px-4 py-3 text-sm print:break-inside-avoid"
    >
      <svg
        viewBox="0 0 24 24"
        aria-hidden="true"
        className="mt-0.5 h-5 w-5 shrink-0 text-caution"
      >
        <path
          d="M13 2 4 14h7l-1 8 9-12h-7l1-8Z"
          fill="none"
          stroke="currentColor"
          strokeWidth="2"
          strokeLinejoin="round"
        />
      </svg>
      <div>
        <h3
          id="insulation-caution-heading"
          className="font-semibold text-caution"
        >
          Insulation and electrical safety
        </h3>
        <p className="mt-0.5 text-graphite-800">
          Every wire&rsquo;s thermal class must be at least the motor&rsquo;s
          insulation class ({insulationClassC}&nbsp;°C here). These figures are
          first-order engineering estimates: the insulation system, electrical
          safety and certification follow local codes and licensed practice.
        </p>
      </div>
    </aside>
  );
}
