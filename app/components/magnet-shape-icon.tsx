import type { MagnetShape } from "~/engineering/magnet-estimate";

/** A small outline of each magnet shape for the shape choice; decoration only. */
export function MagnetShapeIcon({ kind }: { kind: MagnetShape["kind"] }) {
  const common = {
    fill: "none",
    stroke: "currentColor",
    strokeWidth: 1.6,
    strokeLinejoin: "round" as const,
  };
  return (
    <svg
      viewBox="0 0 40 28"
      aria-hidden="true"
      className="h-7 w-10 text-copper-600"
    >
      {kind === "block" ? (
        <g {...common}>
          <path d="M6 11 L24 11 L24 24 L6 24 Z" />
          <path d="M6 11 L14 5 L32 5 L24 11" />
          <path d="M32 5 L32 18 L24 24" />
        </g>
      ) : kind === "arc" ? (
        <g {...common}>
          <path d="M5 22 A 17 17 0 0 1 35 22 L 29 22 A 11 11 0 0 0 11 22 Z" />
        </g>
      ) : kind === "disc" ? (
        <g {...common}>
          <ellipse cx="20" cy="9" rx="14" ry="5" />
          <path d="M6 9 L6 17 A 14 5 0 0 0 34 17 L34 9" />
        </g>
      ) : (
        <g {...common}>
          <ellipse cx="20" cy="9" rx="14" ry="5" />
          <ellipse cx="20" cy="9" rx="6" ry="2.2" />
          <path d="M6 9 L6 17 A 14 5 0 0 0 34 17 L34 9" />
        </g>
      )}
    </svg>
  );
}
