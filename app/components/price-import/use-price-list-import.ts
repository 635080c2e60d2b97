import { useRef, useState } from "react";
import { useFetcher } from "react-router";
import {
  checkColumnMapping,
  type ColumnMapping,
  type PriceListField,
} from "~/price-lists/column-mapping";
import type { MappedColumn } from "./column-mapping-editor";
import { mappingEntries, suggestColumns } from "./mapped-columns";
import type {
  PriceListAnswer,
  PriceListCheck,
  PriceListImport,
} from "./price-list-upload";
import { fileSizeProblem } from "./price-list-file-size";
import type { PriceListHeaderReading } from "./read-price-list-header";

export type PriceImportIntent = "check" | "import";

/** What the page's clientAction answers: the API's answer to a dry run or an import of the file sent as `key`. */
export type ImportStepAnswer =
  | { intent: "check"; key: string; answer: PriceListAnswer<PriceListCheck> }
  | { intent: "import"; key: string; answer: PriceListAnswer<PriceListImport> };

export type FileReading =
  | { state: "none" }
  | { state: "reading"; file: File }
  | { state: "failed"; file: File | null; message: string }
  | ({
      state: "read";
      /** Which choice of file (or of a workbook's sheet) this is, so choosing again starts afresh. */
      token: number;
      file: File;
    } & Extract<PriceListHeaderReading, { ok: true }>);

export interface ImportSupplier {
  id: number;
  name: string;
  currency: string;
}

/**
 * The price-list import's state: the supplier, the file's header as read in the
 * browser, the column choices (suggested from the supplier's saved mapping), and the
 * answers of the dry run and the import, each kept only for the file and choices it
 * was made for.
 */
export function usePriceListImport(
  suppliers: ImportSupplier[],
  savedMappings: Record<number, ColumnMapping>,
) {
  const [supplierId, setSupplierId] = useState("");
  const [reading, setReading] = useState<FileReading>({ state: "none" });
  const [columns, setColumns] = useState<MappedColumn[]>([]);
  const readToken = useRef(0);
  const checkFetcher = useFetcher<ImportStepAnswer>();
  const importFetcher = useFetcher<ImportStepAnswer>();

  const supplier = suppliers.find((entry) => String(entry.id) === supplierId);

  const offerColumns = (
    headers: string[],
    forSupplier: string,
    chosenBefore: readonly MappedColumn[] = [],
  ) =>
    setColumns(
      suggestColumns(
        headers,
        savedMappings[Number(forSupplier)] ?? null,
        chosenBefore,
      ),
    );

  function chooseSupplier(id: string) {
    setSupplierId(id);
    if (reading.state === "read") offerColumns(reading.headers, id);
  }

  async function chooseFile(file: File | undefined, sheet?: string) {
    const token = ++readToken.current;
    const chosenBefore = columns.filter((column) => column.source === "chosen");
    setColumns([]);
    if (!file) return setReading({ state: "none" });
    const tooLarge = fileSizeProblem(file.size);
    if (tooLarge)
      return setReading({ state: "failed", file, message: tooLarge });
    setReading({ state: "reading", file });
    // papaparse and the CSV reading load only now that a file is chosen.
    const { readPriceListHeader } = await import("./read-price-list-header");
    const result = await readPriceListHeader(file, sheet);
    if (token !== readToken.current) return; // a newer file was chosen meanwhile
    if (!result.ok) {
      setReading({ state: "failed", file, message: result.message });
      return;
    }
    setReading({ state: "read", token, file, ...result });
    offerColumns(result.headers, supplierId, chosenBefore);
  }

  /** Another sheet of the workbook: its header is read afresh and the columns offered again. */
  function chooseSheet(sheet: string) {
    if (reading.state === "read") void chooseFile(reading.file, sheet);
  }

  function chooseFields(index: number, fields: PriceListField[]) {
    setColumns((current) =>
      current.map((column, at) =>
        at === index ? { ...column, fields, source: "chosen" } : column,
      ),
    );
  }

  const headers = reading.state === "read" ? reading.headers : [];
  const entries = mappingEntries(columns);
  const mappingCheck = checkColumnMapping(entries, headers, {
    supplierCurrency: supplier?.currency ?? null,
  });
  const mappingMessages = mappingCheck.ok ? [] : mappingCheck.messages;
  const mappingByField = Object.fromEntries(
    entries.map((entry) => [entry.field, entry.header]),
  );
  const ready = supplier !== undefined && reading.state === "read";
  const sheet =
    reading.state === "read" && reading.format === "xlsx" ? reading.sheet : "";
  const key = ready
    ? JSON.stringify([
        reading.token,
        supplier.name,
        reading.file.name,
        reading.file.size,
        sheet,
        mappingByField,
      ])
    : "";

  const busy = checkFetcher.state !== "idle" || importFetcher.state !== "idle";
  const checked =
    checkFetcher.data?.intent === "check" && checkFetcher.data.key === key
      ? checkFetcher.data.answer
      : null;
  const imported =
    importFetcher.data?.intent === "import" && importFetcher.data.key === key
      ? importFetcher.data.answer
      : null;

  function send(intent: PriceImportIntent) {
    if (!ready) return;
    const form = new FormData();
    form.set("intent", intent);
    form.set("key", key);
    form.set("supplier", supplier.name);
    form.set("mapping", JSON.stringify(mappingByField));
    form.set("sheet", sheet);
    form.set("file", reading.file, reading.file.name);
    const fetcher = intent === "check" ? checkFetcher : importFetcher;
    void fetcher.submit(form, {
      method: "post",
      encType: "multipart/form-data",
    });
  }

  const check = checked?.ok ? checked.data : null;
  return {
    supplierId,
    supplier,
    reading,
    columns,
    chooseSupplier,
    chooseFile,
    chooseSheet,
    chooseFields,
    mappingOk: mappingCheck.ok,
    mappingMessages,
    ready,
    busy,
    checking: checkFetcher.state !== "idle",
    importing: importFetcher.state !== "idle",
    checked,
    check,
    imported,
    canImport:
      check !== null && check.invalidCount === 0 && check.valid > 0 && !busy,
    send,
  };
}
