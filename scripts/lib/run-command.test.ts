import { describe, expect, it } from "vitest";
import { runCommandQuietly } from "./run-command";

describe("runCommandQuietly", () => {
  it("keeps a command's output back when it succeeds", async () => {
    await expect(
      runCommandQuietly(process.execPath, [
        "-e",
        "console.log('x'.repeat(10))",
      ]),
    ).resolves.toBeUndefined();
  });

  it("puts the output of a failed command in its error", async () => {
    const failure = runCommandQuietly(process.execPath, [
      "-e",
      "console.log('file sizes'); console.error('the reason'); process.exit(3)",
    ]);
    // Standard output and error arrive on two pipes, in either order.
    await expect(failure).rejects.toThrow(/exit 3\)\. Its output:\n/);
    await expect(failure).rejects.toThrow(/file sizes/);
    await expect(failure).rejects.toThrow(/the reason/);
  });
});
