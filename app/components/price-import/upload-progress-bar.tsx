/**
 * The progress of a price-list upload, shared between the page's clientAction
 * (which sends the file) and the bar that shows it.
 */
import { formatNumber } from "~/lib/format";
import { useSyncExternalStore } from "react";
import type { UploadProgress } from "./price-list-upload";

const idle: UploadProgress = { phase: "idle" };
let current: UploadProgress = idle;
const listeners = new Set<() => void>();

export function reportUploadProgress(progress: UploadProgress): void {
  current = progress;
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useUploadProgress(): UploadProgress {
  return useSyncExternalStore(
    subscribe,
    () => current,
    () => idle,
  );
}

function megabytes(bytes: number): string {
  return `${formatNumber(bytes / 1024 / 1024, 1)}\u00a0MB`;
}

/** A bar with the percent sent, then a "checking" line while the server reads the rows. */
export function UploadProgressBar({ label }: { label: string }) {
  const progress = useUploadProgress();
  if (progress.phase === "idle") return null;
  if (progress.phase === "checking")
    return (
      <p
        role="status"
        className="flex items-center gap-2 text-sm text-graphite-700"
      >
        <span
          aria-hidden="true"
          className="inline-block h-3 w-3 animate-pulse rounded-full bg-copper-500"
        />
        File sent. Turnledger is checking every row…
      </p>
    );
  const percent =
    progress.total > 0
      ? Math.min(100, Math.round((progress.loaded / progress.total) * 100))
      : 0;
  return (
    <div className="space-y-1">
      <div className="flex justify-between text-sm text-graphite-700">
        <span id="upload-progress-label">{label}</span>
        <span aria-hidden="true">
          {percent}% · {megabytes(progress.loaded)} of{" "}
          {megabytes(progress.total)}
        </span>
      </div>
      <div
        role="progressbar"
        aria-labelledby="upload-progress-label"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent}% sent`}
        className="h-2.5 overflow-hidden rounded-full bg-graphite-100"
      >
        <div
          className="h-full rounded-full bg-copper-500 transition-[width]"
          style={{ width: `${percent}%` }}
        />
      </div>
    </div>
  );
}
