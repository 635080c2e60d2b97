import type { WorkbookSheetChoice } from "./read-price-list-header";

/** The sheet of a workbook to read, offered when the workbook has more than one. */
export function SheetChoice({
  sheets,
  sheet,
  onChooseSheet,
}: {
  sheets: WorkbookSheetChoice[];
  sheet: string;
  onChooseSheet: (sheet: string) => void;
}) {
  if (sheets.length < 2) return null;
  return (
    <div className="sm:col-start-2">
      <label htmlFor="import-sheet" className="field-label">
        Sheet
      </label>
      <select
        id="import-sheet"
        value={sheet}
        onChange={(event) => onChooseSheet(event.target.value)}
        className="field-input"
      >
        {sheets.map((entry) => (
          <option key={entry.name} value={entry.name}>
            {entry.hidden ? `${entry.name} (hidden)` : entry.name}
          </option>
        ))}
      </select>
      <p className="mt-1 text-xs text-graphite-500">
        The workbook has {sheets.length} sheets; the price list is read from
        this one.
      </p>
    </div>
  );
}
