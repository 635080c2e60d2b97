import { useRef, useState } from "react";
import {
  Link,
  data,
  useFetcher,
  type ShouldRevalidateFunctionArgs,
} from "react-router";
import type { Route } from "./+types/price-import";
import { requireRole } from "~/auth/guard.server";
import {
  ColumnMappingEditor,
  type MappedColumn,
} from "~/components/price-import/column-mapping-editor";
import { ImportDone } from "~/components/price-import/import-done";
import {
  mappingEntries,
  suggestColumns,
} from "~/components/price-import/mapped-columns";
import {
  InvalidRowsTable,
  PriceListCheckResults,
} from "~/components/price-import/price-list-check-results";
import {
  sendPriceList,
  type PriceListAnswer,
  type PriceListCheck,
  type PriceListImport,
} from "~/components/price-import/price-list-upload";
import {
  fileSizeProblem,
  readPriceListHeader,
} from "~/components/price-import/read-price-list-header";
import {
  reportUploadProgress,
  UploadProgressBar,
} from "~/components/price-import/upload-progress-bar";
import { formatQuantity } from "~/lib/format";
import {
  checkColumnMapping,
  type PriceListField,
} from "~/price-lists/column-mapping";
import { listSavedColumnMappings } from "~/purchasing/saved-column-mappings.server";
import { listSuppliers } from "~/purchasing/suppliers.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, ["buyer"]);
  const [suppliers, savedMappings] = await Promise.all([
    listSuppliers(),
    listSavedColumnMappings(),
  ]);
  return {
    suppliers: suppliers.map(({ id, name, currency }) => ({
      id,
      name,
      currency,
    })),
    savedMappings,
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Import a price list · Turnledger" },
];

type Intent = "check" | "import";
type ImportStepAnswer =
  | { intent: "check"; key: string; answer: PriceListAnswer<PriceListCheck> }
  | { intent: "import"; key: string; answer: PriceListAnswer<PriceListImport> };

/** Sends the file to POST /api/v1/price-lists from the browser; refusals come back as answers to show. */
export async function clientAction({
  request,
}: Route.ClientActionArgs): Promise<ImportStepAnswer> {
  const form = await request.formData();
  const intent: Intent = form.get("intent") === "import" ? "import" : "check";
  const upload = {
    file: form.get("file") as File,
    supplier: String(form.get("supplier") ?? ""),
    mapping: JSON.parse(String(form.get("mapping") ?? "{}")) as Record<
      string,
      string
    >,
    dryRun: intent === "check",
    signal: request.signal,
    onProgress: reportUploadProgress,
  };
  const key = String(form.get("key") ?? "");
  return intent === "check"
    ? { intent, key, answer: await sendPriceList<PriceListCheck>(upload) }
    : { intent, key, answer: await sendPriceList<PriceListImport>(upload) };
}

/** The page works in the browser (clientAction); a plain form post has nothing to do here. */
export async function action({ request }: Route.ActionArgs) {
  await requireRole(request, ["buyer"]);
  throw data(
    {
      message:
        "This page imports from your browser. Scripts: POST /api/v1/price-lists.",
    },
    { status: 405 },
  );
}

/** A dry run changes nothing: the page's data need not be read again after one. */
export function shouldRevalidate({
  formData,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  return formData?.get("intent") === "check" ? false : defaultShouldRevalidate;
}

type FileReading =
  | { state: "none" }
  | { state: "reading"; file: File }
  | { state: "failed"; file: File | null; message: string }
  | {
      state: "read";
      /** Which choice of file this is, so choosing the same file again starts afresh. */
      token: number;
      file: File;
      headers: string[];
      sampleRow: string[];
      encoding: string;
    };

function StepHeading({
  number,
  children,
}: {
  number: number;
  children: string;
}) {
  return (
    <h2 className="flex items-center gap-3 text-lg font-semibold">
      <span
        aria-hidden="true"
        className="inline-flex h-7 w-7 items-center justify-center rounded-full bg-copper-600 text-sm text-white"
      >
        {number}
      </span>
      <span>
        <span className="sr-only">Step {number}: </span>
        {children}
      </span>
    </h2>
  );
}

function Waiting({ children }: { children: string }) {
  return <p className="text-sm text-graphite-500">{children}</p>;
}

export default function PriceImport({ loaderData }: Route.ComponentProps) {
  const { suppliers, savedMappings } = loaderData;
  const [supplierId, setSupplierId] = useState("");
  const [reading, setReading] = useState<FileReading>({ state: "none" });
  const [columns, setColumns] = useState<MappedColumn[]>([]);
  const readToken = useRef(0);
  const checkFetcher = useFetcher<typeof clientAction>();
  const importFetcher = useFetcher<typeof clientAction>();

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

  async function chooseFile(file: File | undefined) {
    const token = ++readToken.current;
    const chosenBefore = columns.filter((column) => column.source === "chosen");
    setColumns([]);
    if (!file) return setReading({ state: "none" });
    const tooLarge = fileSizeProblem(file.size);
    if (tooLarge)
      return setReading({ state: "failed", file, message: tooLarge });
    setReading({ state: "reading", file });
    const result = await readPriceListHeader(file);
    if (token !== readToken.current) return; // a newer file was chosen meanwhile
    if (!result.ok) {
      setReading({ state: "failed", file, message: result.message });
      return;
    }
    setReading({ state: "read", token, file, ...result });
    offerColumns(result.headers, supplierId, chosenBefore);
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
  const key = ready
    ? JSON.stringify([
        reading.token,
        supplier.name,
        reading.file.name,
        reading.file.size,
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

  function send(intent: Intent) {
    if (!ready) return;
    const form = new FormData();
    form.set("intent", intent);
    form.set("key", key);
    form.set("supplier", supplier.name);
    form.set("mapping", JSON.stringify(mappingByField));
    form.set("file", reading.file, reading.file.name);
    const fetcher = intent === "check" ? checkFetcher : importFetcher;
    void fetcher.submit(form, {
      method: "post",
      encType: "multipart/form-data",
    });
  }

  const check = checked?.ok ? checked.data : null;
  const canImport =
    check !== null && check.invalidCount === 0 && check.valid > 0 && !busy;

  return (
    <div className="mx-auto max-w-5xl space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Import a price list</h1>
        <p className="mt-1 text-graphite-700">
          Bring a supplier&apos;s CSV price list into Turnledger: choose the
          file, tell which column holds what, look at the rows, then import them
          in one go.
        </p>
      </div>

      <section aria-labelledby="step-source" className="panel space-y-4">
        <div id="step-source">
          <StepHeading number={1}>Supplier and file</StepHeading>
        </div>
        {suppliers.length === 0 ? (
          <p className="text-graphite-700">
            There are no suppliers yet.{" "}
            <Link to="/suppliers" className="text-copper-700 underline">
              Add the supplier first
            </Link>
            , then come back to import its list.
          </p>
        ) : null}
        <div className="grid gap-4 sm:grid-cols-2">
          <div>
            <label htmlFor="import-supplier" className="field-label">
              Supplier
            </label>
            <select
              id="import-supplier"
              value={supplierId}
              onChange={(event) => chooseSupplier(event.target.value)}
              className="field-input"
            >
              <option value="">Choose the supplier…</option>
              {suppliers.map((entry) => (
                <option key={entry.id} value={entry.id}>
                  {entry.name} ({entry.currency})
                </option>
              ))}
            </select>
            <p className="mt-1 text-xs text-graphite-500">
              {supplier && savedMappings[supplier.id]
                ? "Its last import's column choices are used where the headers match."
                : "The prices are stored for this supplier."}
            </p>
          </div>
          <div>
            <label htmlFor="import-file" className="field-label">
              Price list (CSV, up to 20 MB)
            </label>
            <input
              id="import-file"
              type="file"
              accept=".csv,.txt,text/csv,text/plain"
              onChange={(event) => void chooseFile(event.target.files?.[0])}
              aria-invalid={reading.state === "failed" ? true : undefined}
              aria-describedby="import-file-note"
              className="field-input file:mr-3 file:rounded file:border-0 file:bg-copper-50 file:px-3 file:py-1 file:text-copper-700"
            />
            <div id="import-file-note" aria-live="polite">
              {reading.state === "failed" ? (
                <p className="field-error">{reading.message}</p>
              ) : reading.state === "reading" ? (
                <p role="status" className="mt-1 text-sm text-graphite-700">
                  Reading the file&apos;s header…
                </p>
              ) : reading.state === "read" ? (
                <p className="mt-1 text-xs text-graphite-500">
                  {reading.file.name}:{" "}
                  {formatQuantity(reading.file.size / 1024, "KB", 1)},{" "}
                  {reading.headers.length} columns, read as {reading.encoding}.
                </p>
              ) : (
                <p className="mt-1 text-xs text-graphite-500">
                  Comma, semicolon or tab separated; the first row names the
                  columns.
                </p>
              )}
            </div>
          </div>
        </div>
      </section>

      <section aria-labelledby="step-mapping" className="panel space-y-4">
        <div id="step-mapping">
          <StepHeading number={2}>Match the columns</StepHeading>
        </div>
        {reading.state === "read" ? (
          <>
            <p className="text-sm text-graphite-700">
              Needed: a Supplier SKU column, a Price per unit or Adder per kg
              column, and a Currency column
              {supplier
                ? ` (optional: ${supplier.name} defaults to ${supplier.currency})`
                : " unless the supplier has a default currency"}
              . Columns left out are not imported.
            </p>
            <ColumnMappingEditor
              columns={columns}
              sampleRow={reading.sampleRow}
              supplierCurrency={supplier?.currency ?? null}
              messages={mappingMessages}
              onChange={chooseFields}
            />
          </>
        ) : (
          <Waiting>Choose a file first; its columns appear here.</Waiting>
        )}
      </section>

      <section aria-labelledby="step-check" className="panel space-y-4">
        <div id="step-check">
          <StepHeading number={3}>Check the rows</StepHeading>
        </div>
        {!ready ? (
          <Waiting>Choose the supplier and the file first.</Waiting>
        ) : (
          <>
            <div className="flex flex-wrap items-center gap-3">
              <button
                type="button"
                onClick={() => send("check")}
                disabled={!mappingCheck.ok || busy}
                className="button-quiet min-h-10 px-4 disabled:cursor-not-allowed disabled:opacity-50"
              >
                {checkFetcher.state !== "idle"
                  ? "Checking…"
                  : checked
                    ? "Check again"
                    : "Check the rows"}
              </button>
              <p className="text-sm text-graphite-500">
                Reads every row on the server; nothing is stored yet.
              </p>
            </div>
            {checkFetcher.state !== "idle" ? (
              <UploadProgressBar label={`Sending ${reading.file.name}`} />
            ) : null}
            {checked && !checked.ok ? (
              <p role="alert" className="field-error">
                {checked.message}
              </p>
            ) : null}
            {check ? <PriceListCheckResults check={check} /> : null}
          </>
        )}
      </section>

      <section aria-labelledby="step-import" className="panel space-y-4">
        <div id="step-import">
          <StepHeading number={4}>Import</StepHeading>
        </div>
        {imported?.ok ? (
          <ImportDone result={imported.data} />
        ) : !check ? (
          <Waiting>Check the rows first.</Waiting>
        ) : (
          <>
            <p className="text-sm text-graphite-700">
              The import is all or nothing: every row is stored, or none.
              {check.invalidCount > 0
                ? ` Fix the ${check.invalidCount === 1 ? "row" : `${formatQuantity(check.invalidCount, "")} rows`} with problems in the file, choose it again and check again.`
                : ""}
            </p>
            <div className="flex flex-wrap items-center gap-3">
              <button
                type="button"
                onClick={() => send("import")}
                disabled={!canImport}
                aria-describedby="import-note"
                className="button-primary min-h-11 px-6"
              >
                {importFetcher.state !== "idle"
                  ? "Importing…"
                  : `Import ${formatQuantity(check.valid, "")} ${check.valid === 1 ? "row" : "rows"}`}
              </button>
              <p id="import-note" className="text-sm text-graphite-500">
                {check.invalidCount > 0
                  ? "Not possible while rows have problems."
                  : `For ${supplier?.name ?? "the supplier"}; ${check.newItems === 1 ? "1 new catalogue item" : `${check.newItems} new catalogue items`} will be created.`}
              </p>
            </div>
            {importFetcher.state !== "idle" ? (
              <UploadProgressBar
                label={`Importing ${reading.state === "read" ? reading.file.name : ""}`}
              />
            ) : null}
            {imported && !imported.ok ? (
              <div role="alert" className="space-y-3">
                <p className="field-error">{imported.message}</p>
                {imported.invalid ? (
                  <InvalidRowsTable
                    invalid={imported.invalid}
                    invalidCount={imported.invalidCount}
                  />
                ) : null}
              </div>
            ) : null}
          </>
        )}
      </section>
    </div>
  );
}
