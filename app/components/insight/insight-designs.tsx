/**
 * The design half of the cost insight, shared by the insight page and the manager's
 * start page: the what-if form (a GET form: the what-if lives in the address, the loader
 * works the figures out again, nothing is saved), the stacked chart of cost per N·m with
 * its figures beside it, and the table of cost per motor, cost per N·m and copper loss
 * per N·m with each design's end-turn factor.
 */
import { useMemo } from "react";
import { Link } from "react-router";
import { InsightCsvLink } from "./insight-csv-link";
import { DataTable } from "~/components/data-table";
import { rankByCostPerNm } from "~/insight/design-insight";
import { formatDay } from "~/lib/format";
import { countText } from "~/lib/unit-text";
import { costBasisText } from "../design/price-basis-note";
import { designColumns } from "./design-columns";
import { DesignCostSplit } from "./design-cost-split";
import {
  designsPageHref,
  type InsightDesignsData,
  whatIfSentence,
} from "./design-insight-text";
import { DesignWhatIfForm } from "./design-what-if-form";

function DesignsHeading({ data }: { data: InsightDesignsData }) {
  const currency = data.bases.currency;
  return (
    <div>
      <h2
        id="insight-designs-heading"
        className="break-after-avoid text-lg font-semibold"
      >
        Cost per N·m of released designs
      </h2>
      <p className="text-sm text-graphite-500">
        The latest released revision of each design, newest design first, at the{" "}
        {costBasisText(data.basis)} for {countText(data.quantity, "motor")} on{" "}
        {formatDay(data.designs.date)}, in {currency}. Per N·m is per
        newton-metre of the rated torque, or of the first-order estimate where
        no rated torque is given (marked so).
      </p>
    </div>
  );
}

/** The messages of the address's fields that have no box in the form. */
function AddressErrors({ errors }: { errors: InsightDesignsData["errors"] }) {
  return errors.page || errors.perPage || errors.date ? (
    <p role="alert" className="field-error">
      {[
        ...(errors.page ?? []),
        ...(errors.perPage ?? []),
        ...(errors.date ?? []),
      ].join(" ")}
    </p>
  ) : null;
}

function NoReleasedDesigns() {
  return (
    <p className="panel text-sm text-graphite-500">
      No design has a released revision yet. Builders release revisions on the{" "}
      <Link to="/designs" className="text-copper-700 underline">
        Designs
      </Link>{" "}
      page; they appear here with their costs.
    </p>
  );
}

export function InsightDesigns({
  data,
  action,
}: {
  data: InsightDesignsData;
  /** Where the what-if form goes: the page it is on. */
  action: string;
}) {
  const currency = data.bases.currency;
  const designs = data.designs.designs;
  const sentence = whatIfSentence(data);
  // The same columns and ranking while the data is the same: new cell functions
  // would make React build every cell again (after hydration too).
  const columns = useMemo(() => designColumns(data), [data]);
  const ranking = useMemo(() => rankByCostPerNm(designs), [designs]);
  const pageCount = Math.max(
    1,
    Math.ceil(data.designs.total / data.designs.perPage),
  );
  return (
    <section aria-labelledby="insight-designs-heading" className="space-y-4">
      <DesignsHeading data={data} />
      <DesignWhatIfForm
        data={data}
        action={action}
        whatIfShown={sentence !== null}
      />
      {sentence ? (
        <p
          role="status"
          className="rounded-md border border-copper-300 bg-copper-50 px-4 py-2 text-sm"
        >
          <span className="font-semibold">What-if, not saved:</span> {sentence}.
        </p>
      ) : null}
      <AddressErrors errors={data.errors} />
      {designs.length === 0 ? (
        <NoReleasedDesigns />
      ) : (
        <>
          <DesignCostSplit
            ranking={ranking}
            currency={currency}
            basis={data.basis}
          />
          <DataTable
            caption={`Released designs: cost per motor and per N·m in ${currency}, copper loss per N·m at rated current`}
            columns={columns}
            rows={designs}
            page={data.designs.page}
            pageCount={pageCount}
            pageHref={(page) => designsPageHref(data.fields, page)}
          />
          <InsightCsvLink
            table="designs"
            what="released designs with their costs"
          />
        </>
      )}
    </section>
  );
}
