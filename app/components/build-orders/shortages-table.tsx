/** What a refused reservation could not hold: per item, to hold, free and short. */
import type { Shortage } from "~/build-orders/build-order-errors";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { TableScroll } from "~/components/table-scroll";

export function ShortagesTable({ shortages }: { shortages: Shortage[] }) {
  return (
    <TableScroll label="Short">
      <table className="data-table">
        <caption className="mb-1 text-left text-sm font-medium text-danger">
          Short
        </caption>
        <thead>
          <tr>
            <th scope="col">Item</th>
            <th scope="col" className="text-right">
              To hold
            </th>
            <th scope="col" className="text-right">
              Free
            </th>
            <th scope="col" className="text-right">
              Short
            </th>
          </tr>
        </thead>
        <tbody>
          {shortages.map((shortage) => (
            <tr key={shortage.sku}>
              <td>{shortage.sku}</td>
              <td className="text-right whitespace-nowrap">
                {formatStockQuantity(shortage.required, shortage.unit)}
              </td>
              <td className="text-right whitespace-nowrap">
                {formatStockQuantity(shortage.available, shortage.unit)}
              </td>
              <td className="text-right font-semibold whitespace-nowrap text-danger">
                {formatStockQuantity(shortage.short, shortage.unit)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroll>
  );
}
