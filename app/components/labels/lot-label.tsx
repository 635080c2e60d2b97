/**
 * A lot's label: the item and SKU, the lot number large, the supplier's batch, the supplier,
 * the net quantity on hand when printed, the day received and the QR code. A magnet batch
 * shows its grade, shape and pieces and a short handling caution; a spool its tare.
 */
import { formatDay, formatQuantity } from "~/lib/format";
import type { LotLabel as LotLabelData } from "~/labels/label-types";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { LabelCode, LabelFrame } from "./label-sheet";

function Row({ name, value }: { name: string; value: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-[2mm] border-b border-graphite-200 py-[0.6mm]">
      <dt className="text-graphite-600">{name}</dt>
      <dd className="text-right font-medium">{value}</dd>
    </div>
  );
}

export function LotLabel({
  lot,
  printedOn,
}: {
  lot: LotLabelData;
  printedOn: string;
}) {
  const isMagnet = lot.magnet !== null;
  const what = `lot ${lot.lotNumber} of ${lot.sku}`;
  return (
    <LabelFrame label={`Label of ${what}`}>
      <p className="font-mono text-[3.4mm] font-semibold">{lot.sku}</p>
      <h2 className="text-[3.6mm] leading-tight font-semibold">
        {lot.itemName}
      </h2>
      {lot.sizeOrGrade && lot.sizeOrGrade !== lot.itemName ? (
        <p className="text-[3mm] text-graphite-700">{lot.sizeOrGrade}</p>
      ) : null}
      <p className="mt-[1mm] text-[5.2mm] leading-tight font-bold break-all">
        <span className="text-[3mm] font-normal text-graphite-600">
          {isMagnet
            ? "Batch lot "
            : lot.kind === "wire"
              ? "Spool lot "
              : "Lot "}
        </span>
        {lot.lotNumber}
      </p>
      <dl className="mt-[1mm] text-[2.9mm]">
        {isMagnet ? (
          <>
            <Row
              name="Grade, shape"
              value={`${lot.magnet!.grade}, ${lot.magnet!.shape}`}
            />
            <Row
              name="Pieces"
              value={formatStockQuantity(lot.onHand, lot.unit)}
            />
          </>
        ) : (
          <Row
            name="Net on hand"
            value={formatStockQuantity(lot.onHand, lot.unit)}
          />
        )}
        {lot.tareKg !== null ? (
          <Row name="Tare" value={formatQuantity(lot.tareKg, "kg", 3)} />
        ) : null}
        <Row name="Supplier batch" value={lot.supplierBatch || "—"} />
        {lot.supplierName ? (
          <Row name="Supplier" value={lot.supplierName} />
        ) : null}
        <Row
          name="Received"
          value={lot.receivedOn ? formatDay(lot.receivedOn) : "—"}
        />
      </dl>
      {isMagnet ? (
        <p
          role="note"
          className="mt-[1mm] border-[0.4mm] border-black px-[1mm] py-[0.5mm] text-[2.5mm] leading-snug font-semibold"
        >
          ⚠ Strong magnets: pinch, crush and shatter. Keep from pacemakers and
          implants; handle apart with spacers.
          {lot.magnet!.maxWorkingTemperatureC !== null
            ? ` Not above ${lot.magnet!.maxWorkingTemperatureC} °C.`
            : ""}
        </p>
      ) : null}
      <div className="mt-auto flex items-end justify-between gap-[2mm]">
        <p className="text-[2.4mm] text-graphite-600">
          {lot.locations.length > 0 ? (
            <>
              At {lot.locations.join(", ")}
              <br />
            </>
          ) : null}
          Printed {formatDay(printedOn)}
        </p>
        <LabelCode scan={lot.scan} sizeMm={isMagnet ? 25 : 32} what={what} />
      </div>
    </LabelFrame>
  );
}
