/**
 * The progress of a price list sent for checking or importing, shared between
 * the page's clientAction (which sends the file and reads the server's
 * progress stream) and the bar that shows it: the upload first, then the rows
 * the server has checked or imported out of the file's total.
 */
import { useSyncExternalStore } from "react";
import { useThrottledText } from "~/components/use-throttled-text";
import { formatQuantity } from "~/lib/format";
import type { ProgressStep, RowProgress } from "~/lib/progress-stream";
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

/** How often a screen reader hears the progress, at most. */
const announceEveryMs = 3_000;

function megabytes(bytes: number): string {
  return formatQuantity(bytes / 1024 / 1024, "MB", 1);
}

/** "12,000 of 100,000 rows checked" (numbers in the person's format); the last step of an import says it is saving. */
export function rowsProgressText({
  step,
  processed,
  total,
}: RowProgress): string {
  const counted = `${formatQuantity(Math.min(processed, total), "")} of ${formatQuantity(total, "")} rows`;
  if (step === "check") return `${counted} checked`;
  return processed >= total
    ? `${counted} imported; saving the import…`
    : `${counted} imported`;
}

const fileSentText = "File sent. Turnledger is opening it…";

function percentSent(progress: { loaded: number; total: number }): number {
  return progress.total > 0
    ? Math.min(100, Math.round((progress.loaded / progress.total) * 100))
    : 0;
}

/** What a screen reader is told, now and then (see announceEveryMs). */
function announcementOf(progress: UploadProgress, fileName: string): string {
  switch (progress.phase) {
    case "idle":
      return "";
    case "uploading":
      return `Sending ${fileName}: ${percentSent(progress)}% sent.`;
    case "checking":
      return fileSentText;
    case "rows":
      return `${rowsProgressText(progress)}.`;
  }
}

/**
 * A bar with the percent of the file sent, then one with the rows the server
 * has checked (or imported) out of all of them, as it reports them. The
 * numbers beside the bar are for the eye; screen readers get the bar's value
 * text, and a polite status line at most every few seconds.
 */
export function UploadProgressBar({
  step,
  fileName,
}: {
  step: ProgressStep;
  fileName: string;
}) {
  const progress = useUploadProgress();
  const announcement = useThrottledText(
    announcementOf(progress, fileName),
    announceEveryMs,
  );
  if (progress.phase === "idle") return null;
  return (
    <div className="space-y-1">
      {progress.phase === "checking" ? (
        <p
          aria-hidden="true"
          className="flex items-center gap-2 text-sm text-graphite-700"
        >
          <span className="inline-block h-3 w-3 animate-pulse rounded-full bg-copper-500" />
          {fileSentText}
        </p>
      ) : progress.phase === "uploading" ? (
        <ProgressBar
          label={`${step === "check" ? "Sending" : "Importing"} ${fileName}`}
          value={percentSent(progress)}
          max={100}
          valueText={`${percentSent(progress)}% sent`}
          shown={`${percentSent(progress)}% · ${megabytes(progress.loaded)} of ${megabytes(progress.total)}`}
        />
      ) : (
        <ProgressBar
          label={`${step === "check" ? "Checking" : "Importing"} ${fileName}`}
          value={Math.min(progress.processed, progress.total)}
          max={progress.total}
          valueText={rowsProgressText(progress)}
          shown={rowsProgressText(progress)}
        />
      )}
      <p role="status" className="sr-only">
        {announcement}
      </p>
    </div>
  );
}

function ProgressBar({
  label,
  value,
  max,
  valueText,
  shown,
}: {
  label: string;
  value: number;
  max: number;
  valueText: string;
  shown: string;
}) {
  const width = max > 0 ? Math.min(100, (value / max) * 100) : 0;
  return (
    <>
      <div className="flex flex-wrap justify-between gap-x-4 text-sm text-graphite-700">
        <span id="upload-progress-label">{label}</span>
        <span aria-hidden="true">{shown}</span>
      </div>
      <div
        role="progressbar"
        aria-labelledby="upload-progress-label"
        aria-valuemin={0}
        aria-valuemax={max}
        aria-valuenow={value}
        aria-valuetext={valueText}
        className="h-2.5 overflow-hidden rounded-full bg-graphite-100"
      >
        <div
          className="h-full rounded-full bg-copper-500 transition-[width]"
          style={{ width: `${width}%` }}
        />
      </div>
    </>
  );
}
