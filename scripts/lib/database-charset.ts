/**
 * Before the first migration, a database must store any character: the
 * reference data alone holds Greek letters and symbols (Ω, μ, α, °, ²), which
 * latin1 (a stock MariaDB's default) cannot hold. The migrations declare no
 * character set, so their tables take the database's default; this decides
 * whether that default is right, must be set to utf8mb4 first, or whether the
 * database already holds tables in another character set, which only a new
 * database cures (docs/decisions/029).
 */

/** The collation of Turnledger's own tables (the private MariaDB's default). */
export const preferredCollation = "utf8mb4_unicode_ci";

export interface DatabaseCharsets {
  database: string;
  defaultCharset: string;
  defaultCollation: string;
  /** Every base table but the migration lock, with its default collation. */
  tables: { name: string; collation: string }[];
}

export type CharsetPlan =
  | { kind: "ready" }
  /** ALTER DATABASE … CHARACTER SET utf8mb4 COLLATE `collation`: no table changes. */
  | { kind: "set-default"; collation: string }
  | { kind: "refuse"; message: string };

const isUtf8mb4 = (collation: string) => collation.startsWith("utf8mb4_");

/** How to create a database Turnledger can use. */
export function createDatabaseAdvice(database: string): string {
  return `CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE ${preferredCollation}`;
}

export function charsetPlan(charsets: DatabaseCharsets): CharsetPlan {
  const { database, tables } = charsets;
  const others = tables.filter((table) => !isUtf8mb4(table.collation));
  if (others.length > 0) {
    const named = others
      .slice(0, 5)
      .map((table) => `${table.name} (${table.collation})`)
      .join(", ");
    return {
      kind: "refuse",
      message:
        `The database ${database} holds ${others.length} table${others.length === 1 ? "" : "s"} not in utf8mb4: ${named}` +
        `${others.length > 5 ? ", …" : ""}. Turnledger stores Greek letters and symbols (Ω, μ, °) that only utf8mb4 holds, ` +
        `and does not convert tables it did not create. Create a new database with \`${createDatabaseAdvice("turnledger")}\` ` +
        "(any name), point DATABASE_URL at it and run `npm run db:migrate` again.",
    };
  }
  // New tables must match the existing ones: string columns of two collations
  // cannot be compared in one query. An empty database takes a utf8mb4 default
  // as its owner chose it, or Turnledger's own.
  const existing = [...new Set(tables.map((table) => table.collation))];
  const wanted =
    existing.length === 1
      ? existing[0]!
      : existing.length === 0 && isUtf8mb4(charsets.defaultCollation)
        ? charsets.defaultCollation
        : preferredCollation;
  if (charsets.defaultCollation === wanted) return { kind: "ready" };
  return { kind: "set-default", collation: wanted };
}
