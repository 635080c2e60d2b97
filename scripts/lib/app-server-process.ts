/**
 * How the app server process is started, by `npm start`, `npm run dev`, the
 * tests and the bench alike: Node running server.js under a heap ceiling.
 *
 * The ceiling (APP_HEAP_MB, default 1024 MB) is not a limit the app is expected
 * to reach. V8 sizes its garbage collection to the ceiling: under Node's default
 * (about 4 GB on this machine) it let a 100,000-row price-list import leave
 * 150–300 MB of garbage before collecting; under 1 GB it collects as it goes
 * and the process grows by about 50 MB. See docs/decisions/016-app-server-heap.md.
 */
import path from "node:path";
import { projectRoot } from "./project-paths";

export const appServerHeapMb = heapCeilingMb(process.env.APP_HEAP_MB);

function heapCeilingMb(setting: string | undefined): number {
  if (setting === undefined || setting.trim() === "") return 1024;
  const megabytes = Number(setting);
  if (!Number.isInteger(megabytes) || megabytes < 128)
    throw new Error(
      `APP_HEAP_MB must be a whole number of megabytes, 128 or more (got "${setting}").`,
    );
  return megabytes;
}

/**
 * Node's arguments for the app server process. With APP_CPU_PROFILE_DIR set, the
 * server writes a V8 CPU profile there when it stops (`--cpu-prof`, which Node
 * refuses in NODE_OPTIONS): how the bench's figures are looked into.
 */
export function appServerArguments(): string[] {
  const profileDirectory = process.env.APP_CPU_PROFILE_DIR?.trim();
  return [
    `--max-old-space-size=${appServerHeapMb}`,
    ...(profileDirectory
      ? ["--cpu-prof", `--cpu-prof-dir=${path.resolve(profileDirectory)}`]
      : []),
    path.join(projectRoot, "server.js"),
  ];
}
