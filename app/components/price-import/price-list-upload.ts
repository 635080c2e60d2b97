/**
 * Sends a price list to POST /api/v1/price-lists from the browser with
 * XMLHttpRequest, so the page can show upload progress (fetch cannot report
 * it), and reads the rows' progress the server streams back while it checks
 * or imports them (lib/progress-stream.ts). Every outcome comes back as an
 * answer to show, never as a thrown error; only an abort (a newer request
 * replaced this one) rejects.
 */
import type { ApiAnswer } from "~/lib/api-request";
import {
  ProgressLineReader,
  progressStreamType,
  type ProgressEvent,
  type RowProgress,
} from "~/lib/progress-stream";
import type { LineError } from "~/price-lists/parse-price-list";
import type { PreviewRow } from "~/purchasing/price-import-preview";
import type { PriceImportWarning } from "~/purchasing/price-import-warnings";

/** The dry run's answer (200). */
export interface PriceListCheck {
  /** The first rows, each with the catalogue item it prices. */
  rows: PreviewRow[];
  valid: number;
  /** The first 1,000 lines that cannot be imported. */
  invalid: LineError[];
  /** Every line that cannot be imported. */
  invalidCount: number;
  matched: number;
  newItems: number;
  /** A missing currency rate or metal base: the import goes ahead, but prices will lack something. */
  warnings: PriceImportWarning[];
}

/** The commit's answer: 201 with the import, or 200 when the file was imported before. */
export type PriceListImport =
  | {
      alreadyImported?: false;
      importId: number;
      supplier: string;
      fileName: string;
      rows: number;
      newItems: number;
      warnings: PriceImportWarning[];
    }
  | { alreadyImported: true; importId: number; message: string };

/** A 422 on commit carries the invalid rows (the first 1,000) and their count beside the message. */
export type PriceListAnswer<T> = ApiAnswer<T> & {
  invalid?: LineError[];
  invalidCount?: number;
};

export type UploadProgress =
  | { phase: "idle" }
  | { phase: "uploading"; loaded: number; total: number }
  /** The file is sent; the server is opening it. */
  | { phase: "checking" }
  /** The server's count of rows checked (or imported) so far. */
  | ({ phase: "rows" } & RowProgress);

export interface PriceListUpload {
  file: File;
  supplier: string;
  /** A workbook's sheet to read; "" for a CSV (or a workbook's first visible sheet). */
  sheet: string;
  /** Our field → the file's header. */
  mapping: Record<string, string>;
  dryRun: boolean;
  signal: AbortSignal;
  onProgress: (progress: UploadProgress) => void;
}

export function sendPriceList<T>(
  upload: PriceListUpload,
): Promise<PriceListAnswer<T>> {
  const body = new FormData();
  body.append("supplier", upload.supplier);
  body.append("mapping", JSON.stringify(upload.mapping));
  if (upload.sheet) body.append("sheet", upload.sheet);
  body.append("file", upload.file, upload.file.name);
  const url = `/api/v1/price-lists${upload.dryRun ? "?dryRun=1" : ""}`;

  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    const abort = () => request.abort();
    upload.signal.addEventListener("abort", abort, { once: true });
    request.open("POST", url);
    request.setRequestHeader(
      "Accept",
      `${progressStreamType}, application/json;q=0.9`,
    );
    const stream = new StreamedAnswer();
    request.onprogress = () =>
      stream.read(request, (progress) =>
        upload.onProgress({ phase: "rows", ...progress }),
      );
    request.upload.onprogress = (event) =>
      upload.onProgress({
        phase: "uploading",
        loaded: event.loaded,
        total: event.lengthComputable ? event.total : upload.file.size,
      });
    request.upload.onload = () => upload.onProgress({ phase: "checking" });
    request.onabort = () =>
      reject(new DOMException("The upload was replaced.", "AbortError"));
    request.onerror = () =>
      resolve({
        ok: false,
        status: 0,
        message:
          "Turnledger could not be reached. Check the connection and send the file again.",
        fields: {},
      });
    request.onload = () => {
      if (!stream.streamed(request)) {
        resolve(answerOf<T>(request.status, parsedJson(request.responseText)));
        return;
      }
      stream.read(request, () => undefined);
      resolve(
        stream.result
          ? answerOf<T>(stream.result.status, stream.result.body)
          : {
              ok: false,
              status: 0,
              message:
                "The answer was cut off before the server finished. Send the file again: a file already imported is never stored twice.",
              fields: {},
            },
      );
    };
    request.onloadend = () => {
      upload.signal.removeEventListener("abort", abort);
      upload.onProgress({ phase: "idle" });
    };
    upload.onProgress({
      phase: "uploading",
      loaded: 0,
      total: upload.file.size,
    });
    request.send(body);
  });
}

/** The events of a streamed answer, read from the response text as it grows. */
class StreamedAnswer {
  private readonly lines = new ProgressLineReader();
  private readUpTo = 0;
  result: Extract<ProgressEvent, { type: "result" }> | null = null;

  streamed(request: XMLHttpRequest): boolean {
    return (request.getResponseHeader("Content-Type") ?? "").startsWith(
      progressStreamType,
    );
  }

  read(request: XMLHttpRequest, onRows: (progress: RowProgress) => void) {
    if (!this.streamed(request)) return;
    const text = request.responseText;
    const events = this.lines.push(text.slice(this.readUpTo));
    this.readUpTo = text.length;
    for (const event of events) {
      if (event.type === "result") this.result = event;
      else onRows(event);
    }
  }
}

function parsedJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

function answerOf<T>(status: number, parsed: unknown): PriceListAnswer<T> {
  if (status >= 200 && status < 300 && parsed !== null)
    return { ok: true, data: parsed as T };
  const body = (parsed ?? {}) as {
    error?: { message?: string; fields?: Record<string, string[]> };
    invalid?: LineError[];
    invalidCount?: number;
  };
  return {
    ok: false,
    status,
    message:
      status === 401
        ? "Your session has ended: sign in again, then send the file again."
        : (body.error?.message ??
          `The upload failed (status ${status}). Try again in a moment.`),
    fields: body.error?.fields ?? {},
    invalid: body.invalid,
    invalidCount: body.invalidCount,
  };
}
