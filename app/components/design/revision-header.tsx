import { Link } from "react-router";
import type { CostQuery } from "~/designs/design-page";
import type { DesignPageData } from "~/designs/design-page.server";
import { formatDateTime } from "~/lib/format";
import {
  CreateBuildOrderForm,
  NewRevisionButton,
  ReleaseControl,
  StatusMark,
} from "./revision-actions";
import { BackLink } from "~/components/back-link";

/**
 * The head of a design revision: the way back to the list, the design's name, the
 * revision and its status, and what can be done with it (BOM exports, release, a build
 * order, the next revision).
 */
export function RevisionHeader({
  revision,
  warnings,
  costQuery,
  query,
  latest,
  canEdit,
  canCreateBuildOrder,
}: {
  revision: DesignPageData["revision"];
  warnings: DesignPageData["costing"]["warnings"];
  costQuery: CostQuery;
  /** The cost query as a search string ("?quantity=…"), carried by the export links. */
  query: string;
  /** The newest revision's number. */
  latest: number;
  canEdit: boolean;
  canCreateBuildOrder: boolean;
}) {
  const draft = revision.status === "draft";
  const editable = canEdit && draft;
  const base = `/designs/${revision.designId}/revisions/${revision.revision}`;
  return (
    <>
      <p className="text-sm print:hidden">
        <BackLink to="/designs">Designs</BackLink>
      </p>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <p className="text-sm text-graphite-500">
            Design{revision.motorType ? ` · ${revision.motorType}` : ""}
          </p>
          <h1 className="text-2xl font-semibold break-words">
            {revision.name}
          </h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-graphite-700">
            <span>Revision {revision.revision}</span>
            <StatusMark status={revision.status} />
            <span className="text-sm text-graphite-500">
              {revision.releasedAt
                ? `released ${formatDateTime(revision.releasedAt)}`
                : editable
                  ? "changes are saved line by line"
                  : "being worked on"}
            </span>
          </p>
          {revision.description ? (
            <p className="mt-2 max-w-3xl text-graphite-700">
              {revision.description}
            </p>
          ) : null}
        </div>
        <div className="flex flex-wrap items-start gap-2 print:hidden">
          <a href={`${base}/bom.csv${query}`} className="button-quiet" download>
            BOM as CSV
          </a>
          <Link to={`${base}/print${query}`} className="button-quiet">
            Printable BOM
          </Link>
          {editable ? (
            <ReleaseControl revision={revision.revision} warnings={warnings} />
          ) : null}
          {canCreateBuildOrder && !draft ? (
            <CreateBuildOrderForm
              designId={revision.designId}
              revision={revision.revision}
              quantity={costQuery.quantity}
            />
          ) : null}
          {canEdit && !draft && revision.revision === latest ? (
            <NewRevisionButton next={latest + 1} />
          ) : null}
        </div>
      </div>
    </>
  );
}
