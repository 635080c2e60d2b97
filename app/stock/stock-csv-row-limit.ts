/**
 * The most rows one stock-list CSV export holds; the stock page says so when a view
 * matches more. Its own module so the page shows it without loading the CSV writer
 * (papaparse) with its first-load JavaScript.
 */
export const stockCsvRowLimit = 50_000;
