/** A supplier at a glance: currency, lead time, addresses, how its wire is priced and what deliveries may be. */
import { SummaryFigure } from "~/components/summary-figure";
import { formatDateTime, formatQuantity } from "~/lib/format";

function MailLink({ address }: { address: string | null }) {
  return address ? (
    <a
      href={`mailto:${address}`}
      className="break-all text-copper-700 underline-offset-2 hover:underline"
    >
      {address}
    </a>
  ) : (
    "—"
  );
}

/** "up to 10 %", "up to 2.5 %" (two places only where they count), "none" for 0. */
const allowance = (percent: number) =>
  percent === 0
    ? "none"
    : `up to ${formatQuantity(percent, "%", Number.isInteger(percent) ? 0 : 2)}`;

export function SupplierSummaryFigures({
  supplier,
  priceLineCount,
}: {
  supplier: {
    currency: string;
    leadTimeDays: number | null;
    email: string | null;
    orderEmail: string | null;
    metalBaseFixedAt: "order" | "delivery";
    wireTolerancePercent: number;
    pieceTolerancePercent: number;
    createdAt: string | Date;
  };
  priceLineCount: number;
}) {
  const days = supplier.leadTimeDays;
  return (
    <dl className="panel grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-5">
      <SummaryFigure label="Quotes in" value={supplier.currency} emphasis />
      <SummaryFigure
        label="Lead time"
        value={
          days === null
            ? "not given"
            : formatQuantity(days, days === 1 ? "day" : "days")
        }
      />
      <SummaryFigure
        label="E-mail"
        value={<MailLink address={supplier.email} />}
      />
      <SummaryFigure
        label="E-mail for orders"
        value={
          supplier.orderEmail ? (
            <MailLink address={supplier.orderEmail} />
          ) : (
            <span className="text-graphite-500">the e-mail</span>
          )
        }
      />
      <SummaryFigure
        label="Price lines"
        value={formatQuantity(priceLineCount, "")}
      />
      <SummaryFigure
        label="Wire's metal base"
        value={
          supplier.metalBaseFixedAt === "order"
            ? "fixed at order"
            : "fixed at delivery"
        }
      />
      <SummaryFigure
        label="Over-delivery, wire"
        value={allowance(supplier.wireTolerancePercent)}
      />
      <SummaryFigure
        label="Over-delivery, pieces"
        value={allowance(supplier.pieceTolerancePercent)}
      />
      <SummaryFigure
        label="Supplier since"
        value={formatDateTime(supplier.createdAt)}
      />
    </dl>
  );
}
