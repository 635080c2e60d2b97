/** "Download CSV" of one insight table, with the what-if of the page's address. */
import { useLocation } from "react-router";
import type { InsightCsvTable } from "~/insight/insight-csv";
import { CsvDownloadLink } from "../csv-download-link";

export function InsightCsvLink({
  table,
  what,
}: {
  table: InsightCsvTable;
  what: string;
}) {
  const { search } = useLocation();
  return (
    <CsvDownloadLink href={`/insight/csv/${table}${search}`} table={what} />
  );
}
