/** A numbered step of the price-list import; screen readers hear "Step 2: …". */
export function StepHeading({
  number,
  children,
}: {
  number: number;
  children: string;
}) {
  return (
    <h2 className="flex items-center gap-3 text-lg font-semibold">
      <span
        aria-hidden="true"
        className="inline-flex h-7 w-7 items-center justify-center rounded-full bg-copper-600 text-sm text-white"
      >
        {number}
      </span>
      <span>
        <span className="sr-only">Step {number}: </span>
        {children}
      </span>
    </h2>
  );
}

/** What a step waits for before it can start. */
export function StepWaiting({ children }: { children: string }) {
  return <p className="text-sm text-graphite-500">{children}</p>;
}
