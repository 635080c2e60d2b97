/**
 * The stock list's filters: a search, the kind, below the reorder point only, archived
 * items too; the sort chosen is kept. The list's search box is the shared one.
 */
import { ListSearchForm } from "~/components/lists/list-search-form";
import { stockListSearch, type StockListView } from "~/stock/stock-list-view";

export function StockListFilter({ view }: { view: StockListView }) {
  return (
    <ListSearchForm
      path="/stock"
      label="Filter the stock list"
      search={{ value: view.search, placeholder: "SKU, name, size or grade" }}
      filtered={
        stockListSearch(view, { page: 1, sort: "sku", order: "asc" }) !== ""
      }
      keep={{
        sort: view.sort !== "sku" ? view.sort : undefined,
        order: view.order !== "asc" ? view.order : undefined,
      }}
    >
      <div className="w-40">
        <label htmlFor="stock-kind" className="field-label">
          Kind
        </label>
        <select
          id="stock-kind"
          name="kind"
          defaultValue={view.kind ?? ""}
          className="field-input"
        >
          <option value="">All kinds</option>
          <option value="wire">Wire</option>
          <option value="magnet">Magnet</option>
          <option value="part">Other part</option>
        </select>
      </div>
      <label className="flex items-center gap-2 pb-2 text-sm touch:min-h-11">
        <input
          type="checkbox"
          name="belowReorder"
          value="1"
          defaultChecked={view.belowReorder}
          className="h-4 w-4 accent-copper-600"
        />
        Below reorder point only
      </label>
      <label className="flex items-center gap-2 pb-2 text-sm touch:min-h-11">
        <input
          type="checkbox"
          name="archived"
          value="1"
          defaultChecked={view.archived}
          className="h-4 w-4 accent-copper-600"
        />
        Include archived items
      </label>
    </ListSearchForm>
  );
}
