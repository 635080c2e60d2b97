import { data } from "react-router";
import type { Route } from "./+types/price-import-lines-export";
import { requireUser } from "~/auth/guard.server";
import { idFromText } from "~/lib/search-params";
import {
  findPriceImport,
  listAllImportLines,
} from "~/purchasing/import-history.server";
import {
  priceLinesCsv,
  priceLinesCsvFilename,
} from "~/purchasing/price-lines-csv";

/**
 * GET /suppliers/imports/:importId/lines.csv → every price line the import wrote (not
 * one page) as a CSV download. Whoever may read the past imports page may download it:
 * any signed-in person, as the page.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = idFromText(params.importId);
  const found = id === null ? null : await findPriceImport(id);
  if (!found)
    throw data(
      { message: `There is no price-list import number ${params.importId}.` },
      { status: 404 },
    );
  return new Response(priceLinesCsv(await listAllImportLines(found.id)), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${priceLinesCsvFilename(found.id)}"`,
      "Cache-Control": "no-store",
    },
  });
}
