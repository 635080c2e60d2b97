/**
 * The data of a page of labels: each lot's or location's label with its code and QR code,
 * in the size asked for. The loaders of the label pages call these after their guard; a
 * bad address is a 400 page and a page that names nothing a 404, never a 500.
 */
import { data } from "react-router";
import { appUrl } from "~/lib/app-url.server";
import {
  findLocationLabels,
  findLotLabels,
  lotIdsOfPurchaseReceipt,
} from "./label-data.server";
import { labelQrSvg } from "./label-qr.server";
import type { LocationLabel, LotLabel, PrintedCode } from "./label-types";
import {
  chosenLabelSize,
  labelsPerPageMax,
  type LabelSize,
} from "./label-sizes";
import { scanCodeText, scanCodeUrl, type ScanCode } from "./scan-codes";

/** A 400 page: the label page's address asks for something it cannot print. */
export function refuseLabelAddress(message: string): never {
  throw data({ message }, { status: 400 });
}

/** The size in the address, or a 400 page naming the sizes there are. */
export function labelSizeOr400(
  request: Request,
  fallback: LabelSize,
): LabelSize {
  const size = chosenLabelSize(
    new URL(request.url).searchParams.get("size"),
    fallback,
  );
  return size ?? refuseLabelAddress("Choose the label size 62x100 or a4.");
}

async function printedCode(code: ScanCode): Promise<PrintedCode> {
  const url = scanCodeUrl(appUrl(), code);
  return { text: scanCodeText(code), url, qrSvg: await labelQrSvg(url) };
}

/** The lots' labels, in the order given; a 404 page when none of them is a lot. */
export async function lotLabelsOr404(lotIds: number[]): Promise<LotLabel[]> {
  const found = await findLotLabels(lotIds);
  if (found.length === 0)
    throw data(
      {
        message:
          lotIds.length <= 1
            ? "There is no such lot."
            : "None of these lots exists.",
      },
      { status: 404 },
    );
  return Promise.all(
    found.map(async (lot) => ({
      ...lot,
      scan: await printedCode({ kind: "lot", lotId: lot.lotId }),
    })),
  );
}

/** The lots of a delivery received against a purchase order, or a 404 page. */
export async function lotIdsOfReceiptOr404(
  receiptId: number,
): Promise<number[]> {
  const ids = (await lotIdsOfPurchaseReceipt(receiptId)).slice(
    0,
    labelsPerPageMax,
  );
  if (ids.length === 0)
    throw data(
      { message: "There is no such delivery, or it brought no lots in." },
      { status: 404 },
    );
  return ids;
}

/** The locations' labels, in the order given; a 404 page when none is a location. */
export async function locationLabelsOr404(
  codes: string[],
): Promise<LocationLabel[]> {
  const found = await findLocationLabels(codes);
  if (found.length === 0)
    throw data(
      {
        message:
          codes.length <= 1
            ? "There is no such location."
            : "None of these locations exists.",
      },
      { status: 404 },
    );
  return Promise.all(
    found.map(async (location) => {
      let scan: PrintedCode;
      try {
        scan = await printedCode({ kind: "location", code: location.code });
      } catch {
        refuseLabelAddress(
          `The location code ${location.code} has characters a label's code cannot carry (use letters, digits, "-", "." or "_").`,
        );
      }
      return { ...location, scan };
    }),
  );
}
