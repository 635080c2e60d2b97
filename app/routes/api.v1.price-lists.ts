import type { Route } from "./+types/api.v1.price-lists";
import { requireRole } from "~/auth/guard.server";
import { apiError, methodNotAllowed } from "~/lib/api.server";
import { importPriceList } from "~/purchasing/price-import.server";
import {
  columnMappingFromFields,
  isPriceListField,
} from "~/price-lists/column-mapping";
import { maxPriceListBytes } from "~/price-lists/decode-csv";
import { answerStockError } from "~/stock/stock-api.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, ["buyer"]);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/price-lists (buyer, admin), multipart: file, supplier, mapping (JSON: our field → the
 * file's header). ?dryRun=1 → 200 { rows, valid, invalid, invalidCount, invalidTruncated }; otherwise
 * 201 with the import's summary, or 422 with the invalid rows and nothing written. `invalid` lists
 * the first 1,000 lines with errors; `invalidCount` counts them all.
 */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireRole(request, ["buyer"]);
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const declared = Number(request.headers.get("Content-Length") ?? 0);
  if (declared > maxPriceListBytes + 1_000_000) {
    return apiError(413, "The file is larger than 20 MB.", {
      file: ["The file is larger than 20 MB."],
    });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    return apiError(
      400,
      "Send the price list as multipart/form-data with file, supplier and mapping.",
    );
  }
  const file = form.get("file");
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
  if (upload.size > maxPriceListBytes) {
    return apiError(413, "The file is larger than 20 MB.", {
      file: ["The file is larger than 20 MB."],
    });
  }

  const dryRun = new URL(request.url).searchParams.get("dryRun") === "1";
  return answerStockError(async () => {
    const outcome = await importPriceList({
      supplierName: supplier,
      fileName: upload.name || "price-list.csv",
      bytes: new Uint8Array(await upload.arrayBuffer()),
      mapping: columnMappingFromFields(mappingObject as Record<string, string>),
      dryRun,
      userId: user.id,
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
        const count = (lines: number) => lines.toLocaleString("en-GB");
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
          },
          { status: 201 },
        );
    }
  });
}
