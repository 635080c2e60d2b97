import { formatQuantity } from "~/lib/format";
import { Form } from "react-router";
import { countText, perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { TableScroll } from "~/components/table-scroll";

export interface ItemBestPrices {
  quantity: number;
  unit: string;
  companyCurrency: string;
  prices: {
    supplier: string;
    supplierSku: string;
    currency: string;
    quotedUnitPrice: number;
    adderPerKg: number | null;
    metalBasePerKg: number | null;
    metalBaseDerivedFrom: {
      pricePerKg: number;
      currency: string;
      rate: number;
    } | null;
    rate: number | null;
    unitPrice: number;
    total: number;
    leadTimeDays: number | null;
    packQuantity: number | null;
  }[];
  cannotPrice: { supplier: string; supplierSku: string; reasons: string[] }[];
}

/** The quantity the prices are for: the one the buyer typed, or the item's own rule. */
export interface PriceQuantityChoice {
  /** What the field shows: the typed text, or empty for the item's own quantity. */
  text: string;
  /** Why the typed quantity was not used. */
  error?: string;
  /** Said beside the heading when the buyer chose nothing, e.g. "the suggested order". */
  defaultNote: string;
}

const money = (value: number, currency: string, decimals = 4) =>
  formatQuantity(value, currency, decimals);

/** "9.0000 EUR/kg at 0.92 EUR/USD": where a base the supplier's currency lacks came from. */
export function derivedBaseText(
  derived: NonNullable<
    ItemBestPrices["prices"][number]["metalBaseDerivedFrom"]
  >,
  supplierCurrency: string,
) {
  return `base derived from ${money(derived.pricePerKg, `${derived.currency}/kg`)} at the rate ${derived.rate}\u00a0${derived.currency}/${supplierCurrency}`;
}

/** Why an offer has no price: one line per reason, never run together. */
export function UnpricedReasons({ reasons }: { reasons: string[] }) {
  return (
    <ul className="list-disc space-y-0.5 pl-4 text-sm text-caution">
      {reasons.map((reason) => (
        <li key={reason}>{reason}</li>
      ))}
    </ul>
  );
}

/** The suppliers' current prices for a quantity, cheapest first, in the company currency. */
export function ItemBestPricesPanel({
  prices,
  quantityChoice,
}: {
  prices: ItemBestPrices;
  quantityChoice?: PriceQuantityChoice;
}) {
  return (
    <section aria-labelledby="prices-heading" className="panel space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="prices-heading" className="text-lg font-semibold">
          Best prices for {formatStockQuantity(prices.quantity, prices.unit)}
          {quantityChoice && quantityChoice.text === "" ? (
            <>
              {" "}
              <span className="text-sm font-normal text-graphite-500">
                ({quantityChoice.defaultNote})
              </span>
            </>
          ) : null}
        </h2>
        {quantityChoice ? (
          <Form
            method="get"
            preventScrollReset
            className="flex items-end gap-2"
            aria-label="Price another quantity"
          >
            <div>
              <label htmlFor="price-quantity" className="field-label">
                Quantity{" "}
                <span className="font-normal text-graphite-500">
                  ({prices.unit})
                </span>
              </label>
              <input
                id="price-quantity"
                name="quantity"
                inputMode="decimal"
                autoComplete="off"
                defaultValue={quantityChoice.text}
                placeholder={String(prices.quantity)}
                className="field-input w-32"
                aria-invalid={quantityChoice.error ? true : undefined}
                aria-describedby={
                  quantityChoice.error ? "price-quantity-error" : undefined
                }
              />
            </div>
            <button type="submit" className="button-quiet">
              Price it
            </button>
          </Form>
        ) : null}
      </div>
      {quantityChoice?.error ? (
        <p id="price-quantity-error" className="text-sm text-caution">
          {quantityChoice.error}
        </p>
      ) : null}
      {prices.prices.length === 0 && prices.cannotPrice.length === 0 ? (
        <p className="text-sm text-graphite-500">
          No supplier has quoted this item yet. Import a price list to see
          prices here.
        </p>
      ) : (
        <TableScroll label="Supplier prices, cheapest first">
          <table className="data-table">
            <caption className="sr-only">
              Supplier prices, cheapest first
            </caption>
            <thead>
              <tr>
                <th scope="col">Supplier</th>
                <th scope="col" className="text-right">
                  Per {perUnitWord(prices.unit)} in {prices.companyCurrency}
                </th>
                <th scope="col" className="text-right">
                  Total
                </th>
                <th scope="col">As quoted</th>
              </tr>
            </thead>
            <tbody>
              {prices.prices.map((price) => (
                <tr key={`${price.supplier}-${price.supplierSku}`}>
                  <td>
                    {price.supplier}
                    <span className="block text-xs text-graphite-500">
                      {price.supplierSku}
                      {price.leadTimeDays !== null
                        ? ` · ${countText(price.leadTimeDays, "day")}`
                        : ""}
                      {price.packQuantity !== null
                        ? ` · packs of ${formatStockQuantity(price.packQuantity, prices.unit)}`
                        : ""}
                    </span>
                  </td>
                  <td className="text-right font-medium">
                    {money(price.unitPrice, prices.companyCurrency)}
                  </td>
                  <td className="text-right">
                    {money(price.total, prices.companyCurrency, 2)}
                  </td>
                  <td className="text-sm text-graphite-700">
                    {price.adderPerKg !== null && price.metalBasePerKg !== null
                      ? `${money(price.adderPerKg, price.currency)} adder + ${money(price.metalBasePerKg, price.currency)} metal base`
                      : money(price.quotedUnitPrice, price.currency)}
                    {price.rate !== null &&
                    price.currency !== prices.companyCurrency
                      ? ` at ${price.rate} ${prices.companyCurrency}/${price.currency}`
                      : ""}
                    {price.metalBaseDerivedFrom ? (
                      <span className="block text-xs text-caution">
                        {derivedBaseText(
                          price.metalBaseDerivedFrom,
                          price.currency,
                        )}{" "}
                        (no {price.currency} base kept)
                      </span>
                    ) : null}
                  </td>
                </tr>
              ))}
              {prices.cannotPrice.map((offer) => (
                <tr key={`${offer.supplier}-${offer.supplierSku}-unpriced`}>
                  <td>
                    {offer.supplier}
                    <span className="block text-xs text-graphite-500">
                      {offer.supplierSku}
                    </span>
                  </td>
                  <td className="text-right text-graphite-500">—</td>
                  <td className="text-right text-graphite-500">—</td>
                  <td>
                    <UnpricedReasons reasons={offer.reasons} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </TableScroll>
      )}
    </section>
  );
}
