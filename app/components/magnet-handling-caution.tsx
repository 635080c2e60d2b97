/** The handling caution shown wherever magnets are picked, estimated or stocked (product brief, "Cautions"). */
export function MagnetHandlingCaution() {
  return (
    <aside
      aria-labelledby="magnet-caution-heading"
      className="flex gap-4 rounded-lg border-2 border-caution/60 bg-caution/5 px-5 py-4 print:border print:break-inside-avoid"
    >
      <svg
        viewBox="0 0 24 24"
        aria-hidden="true"
        className="mt-0.5 h-7 w-7 shrink-0 text-caution"
      >
        <path
          d="M12 2.5 22.5 21h-21L12 2.5Z"
          fill="none"
          stroke="currentColor"
          strokeWidth="2"
          strokeLinejoin="round"
        />
        <path
          d="M12 9v5.5"
          stroke="currentColor"
          strokeWidth="2"
          strokeLinecap="round"
        />
        <circle cx="12" cy="17.6" r="1.2" fill="currentColor" />
      </svg>
      <div>
        <h2 id="magnet-caution-heading" className="font-semibold text-caution">
          Handle strong magnets with care
        </h2>
        <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm text-graphite-800">
          <li>
            Strong NdFeB magnets pinch and crush fingers, and shatter into sharp
            splinters when they snap together.
          </li>
          <li>
            They harm pacemakers and other implanted devices: keep them well
            away from anyone who has one.
          </li>
          <li>
            Keep magnets apart and handle them with non-magnetic spacers between
            them.
          </li>
          <li>
            Heating a magnet past its grade&rsquo;s working temperature
            demagnetises it for good.
          </li>
        </ul>
      </div>
    </aside>
  );
}
