/** The fixed lists of the alert tables, importable by browser code (no Drizzle). */

/** How a person hears about low stock: an e-mail per alert, a daily digest, or none. */
export const alertMailModes = ["each", "digest", "none"] as const;
export type AlertMailMode = (typeof alertMailModes)[number];
