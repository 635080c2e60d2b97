import type { Route } from "./+types/stock-journal-export";
import { requireUser } from "~/auth/guard.server";
import { csvFileStart, csvLines } from "~/lib/csv-file";
import { csvDownload, csvFilterRefusal } from "~/lib/csv-download.server";
import { searchParamsObject } from "~/lib/search-params";
import {
  journalCsvFilename,
  journalCsvHeaders,
  journalCsvRow,
} from "~/stock/journal-csv";
import { movementJournalFilterSchema } from "~/stock/movement-journal-query";
import { journalInBatches } from "~/stock/movement-journal.server";

/**
 * GET /stock/journal.csv?type=&sku=&lot=&reference=&user=&from=&to= → every movement of
 * the journal's filtered view (not one page), newest first, streamed a batch at a time.
 * Read by whoever may read the journal.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const values = searchParamsObject(new URL(request.url).searchParams);
  delete values.page;
  delete values.pageSize;
  const parsed = movementJournalFilterSchema.safeParse(values);
  if (!parsed.success) return csvFilterRefusal(parsed.error);
  return csvDownload(
    journalCsvParts(parsed.data),
    journalCsvFilename(new Date()),
  );
}

async function* journalCsvParts(
  filter: Parameters<typeof journalInBatches>[0],
) {
  yield csvFileStart(journalCsvHeaders);
  for await (const batch of journalInBatches(filter))
    yield csvLines(batch.map(journalCsvRow));
}
