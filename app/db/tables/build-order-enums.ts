/** The fixed lists of the build-order tables, importable by browser code (no Drizzle). */
export const buildOrderStatuses = [
  "draft",
  "reserved",
  "in_progress",
  "complete",
  "cancelled",
] as const;
