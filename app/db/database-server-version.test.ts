import { describe, expect, it } from "vitest";
import {
  databaseServerProblem,
  parseServerVersion,
} from "./database-server-version";

// The version strings are as MariaDB and MySQL print them: Debian 12's
// mariadb-server 10.11 (the private MariaDB here), MariaDB's own packages
// ("-MariaDB-log" with binary logging on), and MySQL 8 (no product name).
describe("parseServerVersion", () => {
  it("reads MariaDB's version with Debian's suffix", () => {
    expect(parseServerVersion("10.11.19-MariaDB-0+deb12u1")).toEqual({
      mariadb: true,
      major: 10,
      minor: 11,
      patch: 19,
    });
  });
  it("drops the 5.5.5- prefix of the old handshake", () => {
    expect(parseServerVersion("5.5.5-10.6.16-MariaDB-log")).toEqual({
      mariadb: true,
      major: 10,
      minor: 6,
      patch: 16,
    });
  });
  it("tells MySQL apart: no MariaDB in its version", () => {
    expect(parseServerVersion("8.0.36")).toMatchObject({
      mariadb: false,
      major: 8,
    });
  });
  it("gives up on text that is no version", () => {
    expect(parseServerVersion("unknown")).toBeNull();
  });
});

describe("databaseServerProblem", () => {
  it("accepts MariaDB 10.6, 10.11 and 11.x", () => {
    expect(databaseServerProblem("10.6.0-MariaDB")).toBeNull();
    expect(databaseServerProblem("10.11.19-MariaDB-0+deb12u1")).toBeNull();
    expect(databaseServerProblem("11.4.2-MariaDB-ubu2404")).toBeNull();
  });
  it("refuses MariaDB before 10.6, naming the version found", () => {
    const problem = databaseServerProblem("10.5.23-MariaDB-log");
    expect(problem).toContain("needs MariaDB 10.6 or newer");
    expect(problem).toContain("MariaDB 10.5.23");
    expect(databaseServerProblem("5.5.5-10.3.39-MariaDB")).toContain(
      "MariaDB 10.3.39",
    );
  });
  it("refuses MySQL and unreadable versions, quoting what the server said", () => {
    expect(databaseServerProblem("8.0.36")).toContain('reads "8.0.36"');
    expect(databaseServerProblem("8.0.36")).toContain("not MariaDB");
    expect(databaseServerProblem("")).toContain("needs MariaDB 10.6");
  });
});
