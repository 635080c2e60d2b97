/**
 * Which database server the app talks to, read from `SELECT VERSION()`, and
 * whether Turnledger supports it: MariaDB 10.6 or newer (docs/decisions/029).
 * MariaDB's VERSION() reads "10.11.19-MariaDB-0+deb12u1" (Debian),
 * "10.6.16-MariaDB-log", "11.4.2-MariaDB"; a server that speaks the old
 * MySQL handshake may put "5.5.5-" in front. MySQL says "8.0.36" with no
 * "MariaDB" in it.
 */

export const minimumMariadb = { major: 10, minor: 6 } as const;

export interface DatabaseServerVersion {
  /** MariaDB when VERSION() says so; otherwise another server (MySQL, Percona…). */
  mariadb: boolean;
  major: number;
  minor: number;
  patch: number;
}

export function parseServerVersion(text: string): DatabaseServerVersion | null {
  const version = text.trim().replace(/^5\.5\.5-/, "");
  const numbers = /^(\d+)\.(\d+)(?:\.(\d+))?/.exec(version);
  if (!numbers) return null;
  return {
    mariadb: /mariadb/i.test(version),
    major: Number(numbers[1]),
    minor: Number(numbers[2]),
    patch: Number(numbers[3] ?? 0),
  };
}

/** Why this server will not do, naming what was found; null for MariaDB 10.6 or newer. */
export function databaseServerProblem(versionText: string): string | null {
  const needed = `Turnledger needs MariaDB ${minimumMariadb.major}.${minimumMariadb.minor} or newer`;
  const version = parseServerVersion(versionText);
  if (!version)
    return `${needed}; the database server's version reads "${versionText}", which is not a version Turnledger knows.`;
  if (!version.mariadb)
    return (
      `${needed}; the database server is not MariaDB (its version reads "${versionText}", e.g. MySQL). ` +
      "Point DATABASE_URL at a MariaDB server or Galera cluster."
    );
  const oldEnough =
    version.major > minimumMariadb.major ||
    (version.major === minimumMariadb.major &&
      version.minor >= minimumMariadb.minor);
  if (!oldEnough)
    return `${needed}; the database server is MariaDB ${version.major}.${version.minor}.${version.patch}. Upgrade it (10.11 is the line Turnledger is tested on).`;
  return null;
}
