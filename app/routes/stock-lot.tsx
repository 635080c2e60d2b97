import { data, Link } from "react-router";
import type { Route } from "./+types/stock-lot";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  LotDocumentsPanel,
  type UploadErrors,
} from "~/components/lots/lot-documents-panel";
import { lotBalanceColumns } from "~/components/lots/lot-columns";
import { LotOriginPanel } from "~/components/lots/lot-origin-panel";
import { LotQualityBlock } from "~/components/lots/lot-quality-block";
import { LotWhereUsedPanel } from "~/components/lots/lot-where-used-panel";
import { DataTable } from "~/components/data-table";
import { userCan } from "~/lib/capabilities";
import { redirectWithFlash } from "~/lib/flash.server";
import { findLot, lotIdFromPath } from "~/lots/lot-details.server";
import {
  acceptCertificateUpload,
  isUploadRefusal,
  listLotDocuments,
  lotExists,
  readCertificateUpload,
  storeLotDocument,
  type UploadRefusal,
} from "~/lots/lot-documents.server";
import { lotWhereUsed } from "~/lots/where-used.server";
import { BackLink } from "~/components/back-link";

function lotIdOr404(value: string | undefined): number {
  const id = lotIdFromPath(value);
  if (id === null)
    throw data(
      { message: `"${value}" is not a lot's number in Turnledger.` },
      { status: 404 },
    );
  return id;
}

const noSuchLot = (id: number) =>
  data({ message: `There is no lot ${id}.` }, { status: 404 });

/** GET /stock/lots/:lotId — the lot: origin, hold, balances, certificates, where used. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const id = lotIdOr404(params.lotId);
  const lot = await findLot(id);
  if (!lot) throw noSuchLot(id);
  const [documents, whereUsed] = await Promise.all([
    listLotDocuments(id),
    lotWhereUsed(id, lot.item.unit),
  ]);
  return {
    lot,
    documents,
    ...whereUsed,
    can: {
      hold: userCan(user, "holdLots"),
      attach: userCan(user, "attachLotDocuments"),
      printLabels: userCan(user, "printLabels"),
    },
  };
}

function refused(refusal: UploadRefusal) {
  const errors: UploadErrors =
    refusal.field === ""
      ? { form: [refusal.message] }
      : { [refusal.field]: [refusal.message] };
  return data({ errors }, { status: refusal.status });
}

/**
 * POST /stock/lots/:lotId (multipart: file, title) — attaches a certificate (storekeeper,
 * buyer, admin). Oversize (413) and other than PDF/PNG/JPEG (415) are refused beside the
 * file field, and nothing is stored.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "attachLotDocuments");
  const id = lotIdOr404(params.lotId);
  if (!(await lotExists(id))) throw noSuchLot(id);
  const upload = await readCertificateUpload(request);
  if (isUploadRefusal(upload)) return refused(upload);
  const accepted = await acceptCertificateUpload(upload);
  if (isUploadRefusal(accepted)) return refused(accepted);
  await storeLotDocument(id, accepted, user.id);
  throw await redirectWithFlash(`/stock/lots/${id}`, {
    code: "lot-document-attached",
  });
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `Lot ${loaderData.lot.number} of ${loaderData.lot.item.sku}` : "Lot"} · Turnledger`,
  },
];

export default function StockLot({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { lot, can } = loaderData;
  return (
    <div className="space-y-6">
      <p className="text-sm">
        <BackLink to={`/stock/items/${encodeURIComponent(lot.item.sku)}`}>
          {lot.item.sku}
        </BackLink>
      </p>
      <div>
        <h1 className="text-2xl font-semibold">
          Lot {lot.number}
          {lot.hold ? (
            <span className="ml-3 align-middle text-base font-semibold text-danger">
              On hold
            </span>
          ) : null}
        </h1>
        <p className="mt-1 text-graphite-700">{lot.item.name}</p>
        {can.printLabels ? (
          <p className="mt-2 text-sm">
            <Link
              to={`/labels/lots/${lot.id}`}
              className="font-medium text-copper-700 underline underline-offset-2"
            >
              Print its label
            </Link>
          </p>
        ) : null}
      </div>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-6">
          <LotOriginPanel lot={lot} />
          <section aria-labelledby="lot-balances-heading" className="space-y-2">
            <h2 id="lot-balances-heading" className="text-lg font-semibold">
              Where it is
            </h2>
            <DataTable
              caption={`On hand of lot ${lot.number} by location`}
              columns={lotBalanceColumns(lot.item.unit)}
              rows={lot.balances}
              emptyText="Nothing of this lot is on hand."
            />
          </section>
          <LotWhereUsedPanel
            lotId={lot.id}
            lotNumber={lot.number}
            unit={lot.item.unit}
            uses={loaderData.uses}
            otherIssues={loaderData.otherIssues}
          />
        </div>
        <div className="space-y-6">
          <LotQualityBlock lot={lot} canHold={can.hold} />
          <LotDocumentsPanel
            lotId={lot.id}
            documents={loaderData.documents}
            canAttach={can.attach}
            errors={actionData?.errors}
          />
        </div>
      </div>
    </div>
  );
}
