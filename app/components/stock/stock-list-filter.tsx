/**
 * The stock list's filters: a search, the kind, below the reorder point only, archived
 * items too; the sort chosen is kept. Sent with JavaScript, empty fields stay out of the
 * address.
 */
import { Form, Link, useNavigate } from "react-router";
import { stockListSearch, type StockListView } from "~/stock/stock-list-view";

export function StockListFilter({ view }: { view: StockListView }) {
  const navigate = useNavigate();
  /** Without JavaScript the browser sends the form as it is; with it, empty fields stay out of the address. */
  function showFiltered(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const params = new URLSearchParams();
    for (const [name, value] of new FormData(event.currentTarget)) {
      if (typeof value === "string" && value.trim() !== "")
        params.append(name, value.trim());
    }
    const query = params.toString();
    void navigate(`/stock${query ? `?${query}` : ""}`);
  }
  return (
    <Form
      method="get"
      action="/stock"
      onSubmit={showFiltered}
      className="panel flex flex-wrap items-end gap-4 py-4"
      aria-label="Filter the stock list"
    >
      <div className="w-64">
        <label htmlFor="stock-search" className="field-label">
          Search
        </label>
        <input
          id="stock-search"
          type="search"
          name="search"
          defaultValue={view.search ?? ""}
          maxLength={80}
          placeholder="SKU, name, size or grade"
          className="field-input"
        />
      </div>
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
      {view.sort !== "sku" ? (
        <input type="hidden" name="sort" value={view.sort} />
      ) : null}
      {view.order !== "asc" ? (
        <input type="hidden" name="order" value={view.order} />
      ) : null}
      <div className="flex gap-2 pb-px">
        <button type="submit" className="button-quiet">
          Show
        </button>
        {stockListSearch(view, { page: 1, sort: "sku", order: "asc" }) ? (
          <Link to="/stock" className="button-quiet">
            Clear
          </Link>
        ) : null}
      </div>
    </Form>
  );
}
