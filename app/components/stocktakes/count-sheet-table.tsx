/**
 * One location's part of a blind count sheet on paper: each item and lot to count with
 * its unit, and columns to write in (counted, or a spool's gross weight and tare, and
 * initials). No book quantity: the lines it takes have none. Shared by a stocktake's
 * printed sheet and a location's count sheet.
 */
import type { CountSheetLocation } from "~/stocktakes/count-sheet";
import { printCell, writeInCell } from "../print-page";
import { TableScroll } from "~/components/table-scroll";

const headings = [
  { text: "Item", width: "" },
  { text: "Lot", width: "" },
  { text: "Unit", width: "" },
  { text: "Counted", width: "w-[24mm]" },
  { text: "Gross kg", width: "w-[20mm]" },
  { text: "Tare kg", width: "w-[20mm]" },
  { text: "Initials", width: "w-[16mm]" },
];

/** Blank rows under the lines, for what is found and not on the sheet. */
const blankRows = 3;

export function CountSheetTable({
  location,
  caption,
}: {
  location: CountSheetLocation;
  caption: string;
}) {
  return (
    <TableScroll label={caption}>
      <table className="print-table w-full border-collapse border border-graphite-700">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="bg-graphite-50 text-left">
            {headings.map((heading) => (
              <th
                key={heading.text}
                scope="col"
                className={`${printCell} ${heading.width}`}
              >
                {heading.text}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {location.lines.map((line) => (
            <tr key={line.id} className="break-inside-avoid">
              <td className={printCell}>
                <span className="font-medium">{line.sku}</span> {line.name}
              </td>
              <td className={printCell}>{line.lot ?? "—"}</td>
              <td className={printCell}>{line.unit}</td>
              <td className={writeInCell} />
              <td
                className={`${writeInCell} ${line.weighable ? "" : "bg-graphite-100"}`}
              />
              <td
                className={`${writeInCell} px-2 text-xs text-graphite-500 ${line.weighable ? "" : "bg-graphite-100"}`}
              >
                {line.weighable && line.lotTareKg !== null
                  ? `(${line.lotTareKg})`
                  : ""}
              </td>
              <td className={writeInCell} />
            </tr>
          ))}
          {Array.from({ length: blankRows }, (_, blank) => (
            <tr key={`blank-${blank}`}>
              {headings.map((heading) => (
                <td key={heading.text} className={writeInCell} />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroll>
  );
}
