/**
 * The scan field of the record and receive pages. A keyboard-wedge scanner types a label's
 * code and Enter into the focused field; Enter here looks the code up and never submits the
 * page's form. "Use camera" loads the camera reader (only then) and reads a QR code through
 * the device's camera, with a stop button and plain words when there is no camera or it is
 * not allowed. A foreign or unknown code says so and fills nothing.
 */
import { useEffect, useRef, useState } from "react";
import type { RunningCamera } from "./camera-reader";
import { cameraProblemText } from "~/labels/camera-problems";
import type { ScanLookupAnswer } from "~/labels/label-types";
import { parseScannedText } from "~/labels/scan-codes";

/** What the page did with a scan: the words to show, and whether it filled anything. */
export type ScanOutcome = { filled: boolean; text: string };

type Said = { tone: "ok" | "problem" | "busy"; text: string } | null;

async function lookUp(
  text: string,
): Promise<{ answer: ScanLookupAnswer } | { problem: string }> {
  const read = parseScannedText(text, [window.location.origin]);
  if (read.kind === "foreign")
    return { problem: `${read.reason} Nothing was filled.` };
  try {
    const response = await fetch(
      `/api/v1/scan-lookup?${new URLSearchParams({ code: text.trim() })}`,
      { headers: { Accept: "application/json" } },
    );
    const body = (await response.json()) as
      ScanLookupAnswer | { error: { message: string } };
    if ("error" in body)
      return { problem: `${body.error.message} Nothing was filled.` };
    return { answer: body };
  } catch {
    return {
      problem:
        "The code could not be looked up: check the connection and scan again.",
    };
  }
}

export function ScanPanel({
  onFound,
  hint,
}: {
  /** Fills the page from what was scanned; says what it did. */
  onFound: (answer: ScanLookupAnswer) => ScanOutcome;
  hint: string;
}) {
  const [said, setSaid] = useState<Said>(null);
  const [cameraOn, setCameraOn] = useState(false);
  const viewfinder = useRef<HTMLVideoElement>(null);
  const camera = useRef<RunningCamera | null>(null);

  useEffect(() => () => camera.current?.stop(), []);

  async function read(text: string) {
    setSaid({ tone: "busy", text: "Looking the code up…" });
    const found = await lookUp(text);
    if ("problem" in found) {
      setSaid({ tone: "problem", text: found.problem });
      return;
    }
    const outcome = onFound(found.answer);
    setSaid({ tone: outcome.filled ? "ok" : "problem", text: outcome.text });
  }

  function stopCamera() {
    camera.current?.stop();
    camera.current = null;
    setCameraOn(false);
  }

  async function startCamera() {
    setSaid({ tone: "busy", text: "Starting the camera…" });
    setCameraOn(true);
    try {
      const { startCameraReader } = await import("./camera-reader");
      camera.current = await startCameraReader(viewfinder.current!, (text) => {
        stopCamera();
        void read(text);
      });
      setSaid({
        tone: "busy",
        text: "Hold the label's QR code in front of the camera.",
      });
    } catch (error) {
      camera.current = null;
      setCameraOn(false);
      setSaid({ tone: "problem", text: cameraProblemText(error) });
    }
  }

  return (
    <section
      aria-labelledby="scan-heading"
      className="panel space-y-3 print:hidden"
    >
      <h2 id="scan-heading" className="text-lg font-semibold">
        Scan a label
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-60 flex-1">
          <label htmlFor="scan-code" className="field-label">
            Scanned code
          </label>
          <input
            id="scan-code"
            className="field-input min-h-12 text-lg"
            autoComplete="off"
            autoCapitalize="off"
            spellCheck={false}
            enterKeyHint="search"
            aria-describedby="scan-code-hint"
            onKeyDown={(event) => {
              if (event.key !== "Enter") return;
              // The scanner's Enter ends the code: it must never submit the movement form.
              event.preventDefault();
              const text = event.currentTarget.value;
              event.currentTarget.value = "";
              void read(text);
            }}
          />
        </div>
        {cameraOn ? (
          <button
            type="button"
            className="button-quiet min-h-12"
            onClick={stopCamera}
          >
            Stop camera
          </button>
        ) : (
          <button
            type="button"
            className="button-quiet min-h-12"
            onClick={() => void startCamera()}
          >
            Use camera
          </button>
        )}
      </div>
      <p id="scan-code-hint" className="text-xs text-graphite-500">
        {hint}
      </p>
      <video
        ref={viewfinder}
        muted
        playsInline
        aria-label="Camera view"
        className={
          cameraOn
            ? "max-h-64 w-full max-w-sm rounded-md bg-graphite-900"
            : "hidden"
        }
      />
      <div aria-live="polite" id="scan-result">
        {said ? (
          <p
            className={
              said.tone === "ok"
                ? "rounded-md border border-ok/40 bg-ok/10 px-3 py-2 text-ok"
                : said.tone === "problem"
                  ? "field-error rounded-md border border-danger/40 px-3 py-2"
                  : "text-graphite-600"
            }
          >
            {said.text}
          </p>
        ) : null}
      </div>
    </section>
  );
}
