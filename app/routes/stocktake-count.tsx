import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/stocktake-count";
import { requireCapability } from "~/auth/guard.server";
import { AddLineForm } from "~/components/stocktakes/add-line-form";
import { CountLineForm } from "~/components/stocktakes/count-line-form";
import { isDomainError } from "~/lib/domain-error";
import { flashHeaders } from "~/lib/flash.server";
import { refusalReply } from "~/lib/refusal-reply";
import { countSheet, nextLineId } from "~/stocktakes/count-sheet";
import {
  addFoundLine,
  recordCount,
} from "~/stocktakes/stocktake-counts.server";
import {
  addLineFormSchema,
  countFormSchema,
  isCountSheetIntent,
} from "~/stocktakes/stocktake-forms";
import { stocktakeIdFromPath } from "~/stocktakes/stocktake-reference";
import {
  findStocktakeSummary,
  listBlindLines,
} from "~/stocktakes/stocktakes.server";
import { BackLink } from "~/components/back-link";

async function stocktakeOr404(value: string | undefined) {
  const id = stocktakeIdFromPath(value, (message) =>
    data({ message }, { status: 404 }),
  );
  const stocktake = await findStocktakeSummary(id);
  if (!stocktake)
    throw data({ message: `No stocktake ST-${id}.` }, { status: 404 });
  return stocktake;
}

/** The blind sheet: what to count, never the book. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireCapability(request, "countStock");
  const stocktake = await stocktakeOr404(params.stocktakeId);
  return {
    stocktake: {
      id: stocktake.id,
      reference: stocktake.reference,
      status: stocktake.status,
      locations: stocktake.locations,
    },
    sheet: countSheet(await listBlindLines(stocktake.id)),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "countStock");
  const stocktake = await stocktakeOr404(params.stocktakeId);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (!isCountSheetIntent(intent))
    return data(
      {
        intent: "count" as const,
        result: {
          status: "error" as const,
          error: { "": ["Enter a count or add a line."] },
        },
      },
      { status: 400 },
    );
  if (intent === "count") {
    const submission = parseForm(formData, { schema: countFormSchema });
    const lineId = Number(formData.get("lineId")) || undefined;
    if (submission.status !== "success")
      return data(
        { intent, lineId, result: submission.reply() },
        { status: 400 },
      );
    try {
      await recordCount(stocktake.id, submission.value, user.id);
      return data(
        {
          intent,
          lineId,
          saved: true,
          result: submission.reply({ resetForm: true }),
        },
        { headers: await flashHeaders({ code: "stocktake-count-saved" }) },
      );
    } catch (error) {
      if (!isDomainError(error)) throw error;
      return data(
        {
          intent,
          lineId,
          result: refusalReply(submission, error.field, error.message),
        },
        { status: error.status },
      );
    }
  }
  const submission = parseForm(formData, { schema: addLineFormSchema });
  if (submission.status !== "success")
    return data({ intent, result: submission.reply() }, { status: 400 });
  try {
    const added = await addFoundLine(stocktake.id, submission.value);
    return data(
      {
        intent,
        lineId: added.lineId,
        saved: true,
        result: submission.reply({ resetForm: true }),
      },
      { headers: await flashHeaders({ code: "stocktake-line-added" }) },
    );
  } catch (error) {
    if (!isDomainError(error)) throw error;
    return data(
      { intent, result: refusalReply(submission, error.field, error.message) },
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `Count sheet ${loaderData ? loaderData.stocktake.reference : ""} · Turnledger`,
  },
];

export default function StocktakeCount({ loaderData }: Route.ComponentProps) {
  const { stocktake, sheet } = loaderData;
  const open = stocktake.status === "counting";
  return (
    <div className="mx-auto max-w-xl space-y-5">
      <div>
        <p className="text-sm">
          <BackLink to={`/stocktakes/${stocktake.id}`}>
            {stocktake.reference}
          </BackLink>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">
          Count sheet {stocktake.reference}
        </h1>
        <p className="mt-1 text-sm text-graphite-700">
          Count what is there and type it in; Enter saves the line and moves to
          the next. For a spool, give its net, or its gross weight on the scale
          (the tare on record is filled in).
        </p>
      </div>
      {!open ? (
        <p
          role="alert"
          className="rounded-md border border-rule bg-sheet px-3 py-2"
        >
          This stocktake is {stocktake.status}: counts can no longer change.
        </p>
      ) : null}
      {sheet.length === 0 ? (
        <p>
          Nothing was on the book at these locations. Add what you find below.
        </p>
      ) : null}
      {sheet.map((location) => (
        <section
          key={location.code}
          aria-labelledby={`location-${location.code}`}
          className="space-y-2"
        >
          <h2
            id={`location-${location.code}`}
            className="text-lg font-semibold"
          >
            {location.code}{" "}
            <span className="font-normal text-graphite-500">
              {location.name}
            </span>
          </h2>
          <ul className="space-y-3">
            {location.lines.map((line) => (
              <CountLineForm
                key={line.id}
                line={line}
                nextId={nextLineId(sheet, line.id)}
                disabled={!open}
              />
            ))}
          </ul>
        </section>
      ))}
      {open ? <AddLineForm locations={stocktake.locations} /> : null}
    </div>
  );
}
