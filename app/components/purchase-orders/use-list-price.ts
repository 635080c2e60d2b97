/**
 * The price the supplier's price list gives one line, read from GET /api/v1/items/:sku/prices
 * as the buyer types (the quantity's break applied), for a hint beside the line. Only a
 * hint: the server prices the line again when the order is saved.
 */
import { useEffect, useState } from "react";
import { typedNumber } from "~/lib/number-text";
import { formatPriceText } from "~/lib/format";
import { perUnitWord } from "~/lib/unit-text";

interface PriceAnswer {
  unit: string;
  prices: {
    supplier: string;
    currency: string;
    quotedUnitPrice: number;
    minQuantity: number;
  }[];
  cannotPrice: { supplier: string; reasons: string[] }[];
}

export function useListPrice(
  supplier: string | undefined,
  sku: string,
  quantityText: string,
): string | null {
  const quantity = typedNumber(quantityText) ?? 1;
  const wanted = sku.trim();
  const key =
    supplier && wanted && quantity > 0
      ? `${supplier}|${wanted}|${quantity}`
      : "";
  // The hint is kept with what it was read for, so an older answer never shows for a newer line.
  const [answer, setAnswer] = useState({ key: "", text: "" });
  const setHint = (text: string | null) => setAnswer({ key, text: text ?? "" });
  useEffect(() => {
    if (!key) return;
    const controller = new AbortController();
    const timer = setTimeout(async () => {
      try {
        const response = await fetch(
          `/api/v1/items/${encodeURIComponent(wanted)}/prices?quantity=${quantity}`,
          {
            signal: controller.signal,
            headers: { Accept: "application/json" },
          },
        );
        if (!response.ok) return setHint(null);
        const body = (await response.json()) as PriceAnswer;
        const offer = body.prices.find((price) => price.supplier === supplier);
        const refused = body.cannotPrice.find(
          (offer) => offer.supplier === supplier,
        );
        setHint(
          offer
            ? `Price list: ${formatPriceText(String(offer.quotedUnitPrice))} ${offer.currency}/${perUnitWord(body.unit)} (break from ${offer.minQuantity})`
            : refused
              ? `No list price: ${refused.reasons.join(" ")}`
              : "This supplier's price list does not have this item: give a price of your own.",
        );
      } catch {
        // A newer request replaced this one, or the network failed: no hint.
      }
    }, 300);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
    // setHint changes with the key only.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return key && answer.key === key && answer.text ? answer.text : null;
}
