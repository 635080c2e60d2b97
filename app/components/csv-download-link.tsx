/**
 * "Download CSV" beside a table: the table's rows as a machine-neutral CSV file (decimal
 * point, ISO days), from a route that checks the same role as the page. The link's
 * accessible name says which table, as a page may have several.
 */
export function CsvDownloadLink({
  href,
  table,
}: {
  href: string;
  /** Which table, for screen readers: "stock value by location". */
  table: string;
}) {
  return (
    <p className="text-right text-sm print:hidden">
      <a
        href={href}
        download
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        Download CSV<span className="sr-only"> of {table}</span>
      </a>
    </p>
  );
}
