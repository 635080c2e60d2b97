/**
 * The price the supplier's price list gives one line, read from GET /api/v1/items/:sku/prices
 * as the buyer types (the quantity's break applied), for a hint beside the line. Only a
 * hint: the server prices the line again when the order is saved.
 */
import { useEffect, useState } from "react";
import { typedNumber } from "~/lib/number-text";
import { formatPriceText } from "~/lib/format";

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
  const [hint, setHint] = useState<string | null>(null);
  const quantity = typedNumber(quantityText) ?? 1;
  useEffect(() => {
    const wanted = sku.trim();
    if (!supplier || !wanted || quantity <= 0) {
      setHint(null);
      return;
    }
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
            ? `Price list: ${formatPriceText(String(offer.quotedUnitPrice))} ${offer.currency}/${body.unit} (break from ${offer.minQuantity})`
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
  }, [supplier, sku, quantity]);
  return hint;
}
