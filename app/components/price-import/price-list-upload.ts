/**
 * Sends a price list to POST /api/v1/price-lists from the browser with
 * XMLHttpRequest, so the page can show upload progress (fetch cannot report
 * it). Every outcome comes back as an answer to show, never as a thrown error;
 * only an abort (a newer request replaced this one) rejects.
 */
import type { ApiAnswer } from "~/lib/api-request";
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
  | { phase: "checking" };

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
    request.setRequestHeader("Accept", "application/json");
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
    request.onload = () => resolve(readAnswer<T>(request));
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

function readAnswer<T>(request: XMLHttpRequest): PriceListAnswer<T> {
  let parsed: unknown = null;
  try {
    parsed = JSON.parse(request.responseText);
  } catch {
    parsed = null;
  }
  if (request.status >= 200 && request.status < 300 && parsed !== null)
    return { ok: true, data: parsed as T };
  const body = (parsed ?? {}) as {
    error?: { message?: string; fields?: Record<string, string[]> };
    invalid?: LineError[];
    invalidCount?: number;
  };
  return {
    ok: false,
    status: request.status,
    message:
      request.status === 401
        ? "Your session has ended: sign in again, then send the file again."
        : (body.error?.message ??
          `The upload failed (status ${request.status}). Try again in a moment.`),
    fields: body.error?.fields ?? {},
    invalid: body.invalid,
    invalidCount: body.invalidCount,
  };
}
