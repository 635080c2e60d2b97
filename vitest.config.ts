import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: [
            "app/**/*.test.ts",
            "scripts/**/*.test.ts",
            "seed/**/*.test.ts",
            "server/**/*.test.ts",
            "bench/**/*.test.ts",
          ],
          // Checks against GNU units have their own project (below), so the
          // unit tests need nothing but `npm ci`.
          exclude: ["**/node_modules/**", "**/*.gnu-units.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          // Checks against GNU units (Debian package "units"), the independent
          // reference for the AWG formula: scripts/test.ts installs units when
          // a file of this project is in the run, and each fails, never skips,
          // without it.
          name: "gnu-units",
          include: ["app/**/*.gnu-units.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "app",
          include: ["tests/integration/**/*.test.ts", "tests/e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/global-setup.ts"],
          // One app, one database: files run one after another, tests inside a file in order.
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
          // expect.poll waits on pages and the app as long as Playwright's own
          // waits do (30 s); Vitest's default of 1 s is shorter than one page
          // round trip on a busy 2-core machine.
          expect: { poll: { timeout: 30_000 } },
        },
      },
    ],
  },
});
