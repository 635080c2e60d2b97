import type { Route } from "./+types/design-bom-export";
import { requireUser } from "~/auth/guard.server";
import { bomCsv, bomCsvFilename, type BomCsvLine } from "~/designs/bom-csv";
import { readCostQuery } from "~/designs/design-page";
import { loadDesignPage } from "~/designs/design-page.server";
import { designParams } from "~/designs/design-params";

function plainText(status: number, text: string): Response {
  return new Response(`${text}\n`, {
    status,
    headers: { "Content-Type": "text/plain; charset=utf-8" },
  });
}

/**
 * GET /designs/:designId/revisions/:revision/bom.csv?quantity=N&basis=best-price|stock-average
 * → the revision's bill of materials as a CSV download: per motor and for the build, each
 * line's price and its source, and each coil's geometry. Text cells are formula-guarded.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readCostQuery(new URL(request.url).searchParams);
  const problems = Object.entries(query.errors).map(
    ([field, message]) => `${field}: ${message}`,
  );
  if (problems.length > 0)
    return plainText(
      400,
      `The export's build quantity or price basis is wrong.\n${problems.join("\n")}`,
    );
  const ids = designParams(params);
  const page = ids ? await loadDesignPage(ids, query) : null;
  if (!page) return plainText(404, "There is no such design revision.");

  const { costing, lines, revision } = page;
  const rows: BomCsvLine[] = costing.lines.map((cost, index) => {
    const line = lines[index];
    const input = line?.input;
    const figures = costing.coils.find((coil) => coil.line === index + 1);
    return {
      kind: cost.kind,
      sku: cost.sku,
      name: line?.itemName ?? "",
      perMotorQuantity: cost.perMotorQuantity,
      unit: cost.unit,
      unitPrice: cost.unitPrice,
      cost: cost.cost,
      priceSource: cost.priceSource,
      massBasis: cost.massBasis,
      coil:
        input?.kind === "coil"
          ? {
              turns: input.turns,
              strandsInHand: input.strandsInHand,
              activeLengthMm: input.activeLengthMm,
              endTurnLengthMm: input.endTurnLengthMm,
              leadLengthMm: input.leadLengthMm,
              coilsPerMotor: input.coilsPerMotor,
              scrapPercent: input.scrapPercent,
              operatingTemperatureC: input.operatingTemperatureC,
              copperLengthM: figures?.copperLengthM ?? null,
            }
          : null,
    };
  });
  return new Response(
    bomCsv({
      quantity: costing.quantity,
      currency: costing.currency,
      lines: rows,
    }),
    {
      headers: {
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="${bomCsvFilename(revision.name, revision.revision)}"`,
        "Cache-Control": "no-store",
      },
    },
  );
}
