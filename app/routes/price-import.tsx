import { data, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/price-import";
import { requireCapability } from "~/auth/guard.server";
import { CheckStep } from "~/components/price-import/check-step";
import { ImportStep } from "~/components/price-import/import-step";
import { MappingStep } from "~/components/price-import/mapping-step";
import {
  sendPriceList,
  type PriceListCheck,
  type PriceListImport,
} from "~/components/price-import/price-list-upload";
import { SourceStep } from "~/components/price-import/source-step";
import { reportUploadProgress } from "~/components/price-import/upload-progress-bar";
import {
  usePriceListImport,
  type ImportStepAnswer,
  type PriceImportIntent,
} from "~/components/price-import/use-price-list-import";
import { listSavedColumnMappings } from "~/purchasing/saved-column-mappings.server";
import { listSuppliers } from "~/purchasing/suppliers.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "importPriceLists");
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

/** Sends the file to POST /api/v1/price-lists from the browser; refusals come back as answers to show. */
export async function clientAction({
  request,
}: Route.ClientActionArgs): Promise<ImportStepAnswer> {
  const form = await request.formData();
  const intent: PriceImportIntent =
    form.get("intent") === "import" ? "import" : "check";
  const upload = {
    file: form.get("file") as File,
    supplier: String(form.get("supplier") ?? ""),
    sheet: String(form.get("sheet") ?? ""),
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
  await requireCapability(request, "importPriceLists");
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

export default function PriceImport({ loaderData }: Route.ComponentProps) {
  const { suppliers, savedMappings } = loaderData;
  const priceImport = usePriceListImport(suppliers, savedMappings);
  const { supplier, reading } = priceImport;
  const fileName = reading.state === "read" ? reading.file.name : "";

  return (
    <div className="mx-auto max-w-5xl space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Import a price list</h1>
        <p className="mt-1 text-graphite-700">
          Bring a supplier&apos;s price list (CSV or .xlsx workbook) into
          Turnledger: choose the file, tell which column holds what, look at the
          rows, then import them in one go.
        </p>
      </div>

      <SourceStep
        suppliers={suppliers}
        supplierId={priceImport.supplierId}
        hasSavedMapping={Boolean(supplier && savedMappings[supplier.id])}
        reading={reading}
        onChooseSupplier={priceImport.chooseSupplier}
        onChooseFile={priceImport.chooseFile}
        onChooseSheet={priceImport.chooseSheet}
      />
      <MappingStep
        reading={reading}
        supplier={supplier}
        columns={priceImport.columns}
        messages={priceImport.mappingMessages}
        onChooseFields={priceImport.chooseFields}
      />
      <CheckStep
        ready={priceImport.ready}
        fileName={fileName}
        mappingOk={priceImport.mappingOk}
        busy={priceImport.busy}
        checking={priceImport.checking}
        checked={priceImport.checked}
        onCheck={() => priceImport.send("check")}
      />
      <ImportStep
        check={priceImport.check}
        imported={priceImport.imported}
        importing={priceImport.importing}
        canImport={priceImport.canImport}
        supplierName={supplier?.name}
        fileName={fileName}
        onImport={() => priceImport.send("import")}
      />
    </div>
  );
}
