import { formatStockQuantity } from "~/stock/stock-quantity-text";

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
    rate: number | null;
    unitPrice: number;
    leadTimeDays: number | null;
  }[];
  cannotPrice: { supplier: string; supplierSku: string; reasons: string[] }[];
}

const money = (value: number, currency: string, decimals = 4) =>
  `${value.toLocaleString("en-GB", { minimumFractionDigits: decimals, maximumFractionDigits: decimals })}\u00a0${currency}`;

/** The suppliers' current prices for the reorder quantity, cheapest first, in the company currency. */
export function ItemBestPricesPanel({ prices }: { prices: ItemBestPrices }) {
  return (
    <section aria-labelledby="prices-heading" className="panel space-y-3">
      <h2 id="prices-heading" className="text-lg font-semibold">
        Best prices for {formatStockQuantity(prices.quantity, prices.unit)}
      </h2>
      {prices.prices.length === 0 && prices.cannotPrice.length === 0 ? (
        <p className="text-sm text-graphite-500">
          No supplier has quoted this item yet. Import a price list to see
          prices here.
        </p>
      ) : (
        <table className="data-table">
          <caption className="sr-only">Supplier prices, cheapest first</caption>
          <thead>
            <tr>
              <th scope="col">Supplier</th>
              <th scope="col" className="text-right">
                Per {prices.unit} in {prices.companyCurrency}
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
                      ? ` · ${price.leadTimeDays} days`
                      : ""}
                  </span>
                </td>
                <td className="text-right font-medium">
                  {money(price.unitPrice, prices.companyCurrency)}
                </td>
                <td className="text-sm text-graphite-700">
                  {price.adderPerKg !== null && price.metalBasePerKg !== null
                    ? `${money(price.adderPerKg, price.currency)} adder + ${money(price.metalBasePerKg, price.currency)} metal base`
                    : money(price.quotedUnitPrice, price.currency)}
                  {price.rate !== null &&
                  price.currency !== prices.companyCurrency
                    ? ` at ${price.rate} ${prices.companyCurrency}/${price.currency}`
                    : ""}
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
                <td className="text-sm text-caution">
                  {offer.reasons.join(" ")}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
