/**
 * The private MariaDB is locked down from its first start: root gets its
 * password while the server listens on its socket alone, and the application
 * user may touch only its own databases, with only what the app needs.
 */
import fs from "node:fs";
import mysql from "mysql2/promise";
import { afterAll, describe, expect, it } from "vitest";
import {
  appUser,
  appUserPrivileges,
  connectAsRoot,
  ensureLocalMariadb,
  mariadbInstance,
  stopLocalMariadb,
} from "../../scripts/lib/local-mariadb";

const testPort = Number(process.env.TEST_PORT ?? 3100);
// One past the fault tests' MariaDB (tests/support/fault-environment.ts).
const freshPort = 3318 + (testPort - 3100);
const fresh = mariadbInstance({
  name: `mariadb-first-start-${freshPort}`,
  port: freshPort,
});

function removeFresh() {
  fs.rmSync(fresh.dataDir, { recursive: true, force: true });
  for (const file of [fresh.credentialsFile, fresh.logFile])
    fs.rmSync(file, { force: true });
}

afterAll(async () => {
  await stopLocalMariadb(fresh);
  removeFresh();
});

describe("a new private MariaDB", () => {
  it("sets root's password before it listens on any port", async () => {
    await stopLocalMariadb(fresh); // left running by a run cut short
    removeFresh();
    await ensureLocalMariadb({ instance: fresh, databases: [] });

    // MariaDB logs each start's port; the first start of a new data folder
    // (the one that still had a root without password) listened on none.
    const starts = [
      ...fs
        .readFileSync(fresh.logFile, "utf8")
        .matchAll(/ready for connections\.\s*Version: .*?port: (\d+)/g),
    ].map((match) => Number(match[1]));
    expect(starts).toEqual([0, freshPort]);

    // Over TCP, root without a password is refused; with it, served.
    await expect(
      mysql.createConnection({
        host: "127.0.0.1",
        port: freshPort,
        user: "root",
        password: "",
      }),
    ).rejects.toMatchObject({ code: "ER_ACCESS_DENIED_ERROR" });
    const credentials = JSON.parse(
      fs.readFileSync(fresh.credentialsFile, "utf8"),
    ) as { rootPassword: string };
    expect(credentials.rootPassword.length).toBeGreaterThanOrEqual(20);
    const root = await mysql.createConnection({
      host: "127.0.0.1",
      port: freshPort,
      user: "root",
      password: credentials.rootPassword,
    });
    await root.end();
  });
});

describe("the application user", () => {
  it("holds only what the app needs, on its own databases", async () => {
    // The project's own instance, as `npm start` and the tests leave it.
    await ensureLocalMariadb();
    const root = await connectAsRoot();
    try {
      for (const host of ["127.0.0.1", "localhost"]) {
        const [rows] = await root.query("SHOW GRANTS FOR ?@?", [appUser, host]);
        // "GRANT <privileges> ON <where> TO …", privileges in MariaDB's own order.
        const grants = (rows as Record<string, string>[])
          .map((row) => Object.values(row)[0]!)
          .map((grant) => {
            const [, privileges, where] = grant.match(
              /^GRANT (.+) ON (\S+) TO /,
            )!;
            return { where, privileges: privileges!.split(", ").sort() };
          })
          .sort((a, b) => a.where!.localeCompare(b.where!));
        const own = [...appUserPrivileges].sort();
        expect(grants).toEqual(
          [
            { where: "*.*", privileges: ["USAGE"] },
            { where: "`turnledger`.*", privileges: own },
            { where: "`turnledger\\_test%`.*", privileges: own },
          ].sort((a, b) => a.where.localeCompare(b.where)),
        );
      }
    } finally {
      await root.end();
    }
  });
});
