/**
 * The one search box of a list page: a GET form whose fields land in the address, so a
 * filtered list can be bookmarked and shared, and the server filters and pages. The
 * search field comes first, then the list's own filters (children), "Show" and, once
 * anything narrows the list, "Clear". `/` anywhere on the page (not while typing) moves
 * the focus to the search field.
 */
import { EmptyState } from "~/components/empty-state";
import { useEffect, useRef, type ReactNode } from "react";
import { Form, Link, useNavigate } from "react-router";
import { searchMaxLength } from "~/lib/list-filters";
import { isSearchShortcut } from "~/lib/search-shortcut";

export interface SearchField {
  /** The parameter in the address; "search" unless the list names its box otherwise. */
  name?: string;
  label?: string;
  placeholder?: string;
  value?: string;
}

export function ListSearchForm({
  path,
  label,
  search,
  filtered,
  keep = {},
  children,
}: {
  /** The list's path: the form's target and the "Clear" link. */
  path: string;
  /** The form's accessible name: "Filter the designs". */
  label: string;
  search: SearchField;
  /** Something narrows the list now: "Clear" is shown. */
  filtered: boolean;
  /** Values kept as they are (a sort), sent unless empty. */
  keep?: Record<string, string | undefined>;
  children?: ReactNode;
}) {
  const navigate = useNavigate();
  const searchBox = useRef<HTMLInputElement>(null);
  useSearchShortcut(searchBox);
  const name = search.name ?? "search";
  const id = `list-${name}`;

  /** Without JavaScript the browser sends the form as it is; with it, empty fields stay out of the address. */
  function showFiltered(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const params = new URLSearchParams();
    for (const [field, value] of new FormData(event.currentTarget)) {
      if (typeof value === "string" && value.trim() !== "")
        params.append(field, value.trim());
    }
    const query = params.toString();
    void navigate(`${path}${query ? `?${query}` : ""}`);
  }

  return (
    <Form
      method="get"
      action={path}
      onSubmit={showFiltered}
      aria-label={label}
      className="panel flex flex-wrap items-end gap-4 py-4"
    >
      <div className="w-64">
        <label htmlFor={id} className="field-label">
          {search.label ?? "Search"}{" "}
          <kbd
            aria-hidden="true"
            className="ml-1 rounded border border-graphite-300 px-1 text-xs font-normal text-graphite-500"
            title="Press / to come here"
          >
            /
          </kbd>
        </label>
        <input
          ref={searchBox}
          id={id}
          type="search"
          name={name}
          defaultValue={search.value ?? ""}
          maxLength={searchMaxLength}
          placeholder={search.placeholder}
          aria-keyshortcuts="/"
          className="field-input"
        />
      </div>
      {children}
      {Object.entries(keep).map(([field, value]) =>
        value ? (
          <input key={field} type="hidden" name={field} value={value} />
        ) : null,
      )}
      <div className="flex gap-2 pb-px">
        <button type="submit" className="button-quiet">
          Show
        </button>
        {filtered ? (
          <Link to={path} className="button-quiet">
            Clear
          </Link>
        ) : null}
      </div>
    </Form>
  );
}

/** `/` focuses `field` (and selects its text) unless someone is typing somewhere. */
export function useSearchShortcut(
  field: React.RefObject<HTMLInputElement | null>,
) {
  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      if (!isSearchShortcut(event, event.target as HTMLElement | null)) return;
      const input = field.current;
      if (!input) return;
      event.preventDefault();
      input.focus();
      input.select();
    }
    document.addEventListener("keydown", onKeyDown);
    return () => document.removeEventListener("keydown", onKeyDown);
  }, [field]);
}

/**
 * What an empty list says: with filters, that nothing matches and how to clear them;
 * without, the list's own empty text (what to do first).
 */
export function ListEmptyText({
  filtered,
  clearHref,
  emptyText,
}: {
  filtered: boolean;
  clearHref: string;
  emptyText: ReactNode;
}) {
  if (!filtered) return <>{emptyText}</>;
  return (
    <EmptyState
      message="No results for this search."
      clear={{ to: clearHref, label: "Clear the search and filters" }}
    />
  );
}

/** A labelled choice among the list's filters ("Status: all, draft, …"). */
export function FilterChoice({
  name,
  label,
  value,
  options,
  allLabel = "All",
}: {
  name: string;
  label: string;
  value?: string | null;
  options: readonly { value: string; label: string }[];
  allLabel?: string;
}) {
  const id = `list-filter-${name}`;
  return (
    <div className="w-44">
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select
        id={id}
        name={name}
        defaultValue={value ?? ""}
        className="field-input"
      >
        <option value="">{allLabel}</option>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}

/** A labelled text or day among the list's filters ("Lot", "From"). */
export function FilterText({
  name,
  label,
  value,
  type = "text",
  maxLength = searchMaxLength,
}: {
  name: string;
  label: string;
  value?: string | null;
  type?: "text" | "date";
  maxLength?: number;
}) {
  const id = `list-filter-${name}`;
  return (
    <div className={type === "date" ? "w-40" : "w-44"}>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <input
        id={id}
        type={type}
        name={name}
        defaultValue={value ?? ""}
        maxLength={type === "date" ? undefined : maxLength}
        className="field-input"
      />
    </div>
  );
}

/** The filters of the address a list could not use, named, so nobody trusts a view it does not show. */
export function IgnoredFilters({ names }: { names: readonly string[] }) {
  if (names.length === 0) return null;
  return (
    <p
      role="alert"
      className="rounded-md border border-caution/40 bg-caution/5 px-3 py-2 text-sm text-graphite-800"
    >
      Left out of the view because their values in the address were not
      understood: {names.join(", ")}.
    </p>
  );
}
