import {
  FormDataParseError,
  MaxFileSizeExceededError,
  MaxTotalSizeExceededError,
  MultipartParseError,
  parseFormData,
} from "@remix-run/form-data-parser";
import type { Route } from "./+types/api.v1.price-lists";
import { requireCapability } from "~/auth/guard.server";
import { formatNumber } from "~/lib/format";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { importPriceList } from "~/purchasing/price-import.server";
import {
  columnMappingFromFields,
  isPriceListField,
} from "~/price-lists/column-mapping";
import {
  fileTooLargeMessage,
  maxPriceListBytes,
} from "~/price-lists/decode-csv";
import { answerDomainError } from "~/lib/api-errors.server";
import {
  progressStreamAnswer,
  wantsProgressStream,
  type ReportProgress,
} from "~/lib/progress-stream.server";
import {
  layoutAnswerOf,
  openPriceList,
} from "~/price-lists/open-price-list.server";
import {
  priceListUploadMode,
  priceListUploadQuerySchema,
} from "~/price-lists/upload-query";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "importPriceLists");
  return methodNotAllowed(["POST"]);
}

/**
 * Reads the upload's form as it arrives: the file is refused (MaxFileSizeExceededError) as soon
 * as it passes 20 MB, before the rest is read; the other fields are a few short texts.
 */
function readUploadForm(request: Request): Promise<FormData> {
  return parseFormData(request, {
    maxFiles: 1,
    maxFileSize: maxPriceListBytes,
    maxParts: 20,
    maxTotalSize: maxPriceListBytes + 64 * 1024,
  });
}

/**
 * The file's name as the sender chose it. Browsers and fetch send `"`, CR and LF in a
 * multipart file name as %22, %0D and %0A (HTML Standard, multipart/form-data encoding);
 * the parser leaves them so, and a name is stored and shown as it was chosen.
 */
function uploadedFileName(file: File): string {
  return file.name
    .replaceAll("%22", '"')
    .replaceAll("%0D", "\r")
    .replaceAll("%0A", "\n");
}

/**
 * POST /api/v1/price-lists (buyer, admin), multipart: file (CSV, or an .xlsx workbook: told by its
 * content), sheet (optional: the workbook's sheet to read, by name; else its first visible sheet),
 * supplier, mapping (JSON: our field → the file's header; supplierSku and itemSku may name the same
 * header). ?layout=1 (file and sheet only) → 200 { format, headers, sampleRow, headerLine, and
 * sheets [{ name, hidden }] and sheet for a workbook, or encoding for a CSV }: what a mapping needs.
 * ?dryRun=1 → 200 { rows, valid,
 * invalid, invalidCount, invalidTruncated, matched, newItems, warnings }, each row with `match`: the
 * catalogue item it prices ({ sku, name, kind, newItem, by }); otherwise 201 with the import's
 * summary and `warnings`, or 422 with the invalid rows and nothing written. `invalid` lists the first
 * 1,000 lines with errors; `invalidCount` counts them all. `warnings` ({ kind, currency, conductor?,
 * message }) name a missing currency rate or metal base; they never stop an import.
 *
 * Progress (opt-in): with `Accept: application/x-ndjson`, a dry run or commit whose fields are in
 * order answers 200 with a stream of lines: { type: "progress", step: "check" | "import",
 * processed, total } (data rows read out of the file's, at least every 10,000 rows or 250 ms),
 * then { type: "result", status, body }: the status and body the request answers without the
 * stream. Refusals before the work starts (role, size, fields) are answered as always.
 */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "importPriceLists");
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const mode = priceListUploadMode(
    readSearchParams(request, priceListUploadQuerySchema),
  );
  // The body's size as a whole is bounded before this runs (server/request-size-limits.ts).
  let form: FormData;
  try {
    form = await readUploadForm(request);
  } catch (error) {
    if (
      error instanceof MaxFileSizeExceededError ||
      error instanceof MaxTotalSizeExceededError
    )
      return apiError(413, fileTooLargeMessage, {
        file: [fileTooLargeMessage],
      });
    if (
      error instanceof FormDataParseError ||
      error instanceof MultipartParseError
    )
      return apiError(
        400,
        "Send the price list as multipart/form-data with file, supplier and mapping.",
      );
    throw error;
  }
  const file = form.get("file");
  const sheet = String(form.get("sheet") ?? "").trim() || null;
  if (mode === "layout") return answerLayout(file, sheet);
  const supplier = String(form.get("supplier") ?? "").trim();
  const fields: Record<string, string[]> = {};
  if (!(file instanceof File))
    fields.file = ['Attach the price list as the field "file".'];
  if (!supplier) fields.supplier = ["Give the supplier's name."];
  let mappingObject: unknown;
  try {
    mappingObject = JSON.parse(String(form.get("mapping") ?? ""));
  } catch {
    fields.mapping = [
      'The mapping must be JSON: { "price": "Unit price", … }.',
    ];
  }
  if (
    mappingObject !== undefined &&
    (typeof mappingObject !== "object" ||
      mappingObject === null ||
      Array.isArray(mappingObject))
  ) {
    fields.mapping = [
      "The mapping must be a JSON object from our field names to the file's headers.",
    ];
  }
  const unknownFields =
    mappingObject && typeof mappingObject === "object"
      ? Object.keys(mappingObject).filter((key) => !isPriceListField(key))
      : [];
  if (unknownFields.length > 0)
    fields.mapping = [
      `Unknown fields in the mapping: ${unknownFields.join(", ")}.`,
    ];
  if (Object.keys(fields).length > 0)
    return apiError(400, "Some fields are missing or wrong.", fields);
  const upload = file as File;

  const dryRun = mode === "check";
  const answer = (onProgress?: ReportProgress) =>
    answerDomainError(async () => {
      const outcome = await importPriceList({
        supplierName: supplier,
        fileName: uploadedFileName(upload) || "price-list.csv",
        bytes: new Uint8Array(await upload.arrayBuffer()),
        sheet,
        mapping: columnMappingFromFields(
          mappingObject as Record<string, string>,
        ),
        dryRun,
        userId: user.id,
        onProgress,
      });
      switch (outcome.kind) {
        case "refused":
          return apiError(400, outcome.messages.join(" "), {
            file: outcome.messages,
          });
        case "preview":
          return Response.json(outcome.preview);
        case "invalid": {
          // At most 1,000 lines are listed; the count and the flag say when there were more.
          const truncated = outcome.invalidCount > outcome.invalid.length;
          const count = (lines: number) => formatNumber(lines);
          return Response.json(
            {
              error: {
                message: `${count(outcome.invalidCount)} rows are invalid; nothing was imported.${truncated ? ` The first ${count(outcome.invalid.length)} are listed.` : ""}`,
              },
              valid: outcome.valid,
              invalid: outcome.invalid,
              invalidCount: outcome.invalidCount,
              invalidTruncated: truncated,
            },
            { status: 422 },
          );
        }
        case "already-imported":
          return Response.json({
            importId: outcome.importId,
            alreadyImported: true,
            message: "This file was imported before; nothing changed.",
          });
        case "imported":
          return Response.json(
            {
              importId: outcome.importId,
              supplier: outcome.supplier,
              fileName: outcome.fileName,
              rows: outcome.rows,
              newItems: outcome.newItems,
              warnings: outcome.warnings,
            },
            { status: 201 },
          );
      }
    });
  return wantsProgressStream(request)
    ? progressStreamAnswer(request, dryRun ? "check" : "import", answer)
    : answer();
}

/** ?layout=1: the file's header row, first data row and (for a workbook) sheets; nothing is written. */
async function answerLayout(
  file: FormDataEntryValue | null,
  sheet: string | null,
): Promise<Response> {
  if (!(file instanceof File))
    return apiError(400, "Some fields are missing or wrong.", {
      file: ['Attach the price list as the field "file".'],
    });
  const opened = await openPriceList(
    new Uint8Array(await file.arrayBuffer()),
    uploadedFileName(file),
    sheet,
  );
  if (!opened.ok)
    return apiError(400, opened.message, { file: [opened.message] });
  return Response.json(layoutAnswerOf(opened));
}
