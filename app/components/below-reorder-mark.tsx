/** Marks stock whose available quantity is below its reorder point: an icon and words, never colour alone. */
export function BelowReorderMark({
  label = "Below reorder point",
}: {
  label?: string;
}) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded border border-caution/50 bg-caution/10 px-1.5 py-0.5 text-xs font-medium text-caution">
      <svg viewBox="0 0 16 16" aria-hidden="true" className="h-3.5 w-3.5">
        <path
          d="M8 2v9M4 7.5 8 11.5l4-4"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
        <path
          d="M3 14h10"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
        />
      </svg>
      {label}
    </span>
  );
}
