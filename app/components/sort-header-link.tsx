import { Link } from "react-router";

/**
 * A column header that sorts a server-paged list through the address
 * (`?sort=&order=`), so the sort survives a reload and a shared link. The
 * arrow is decoration; the words say the state to screen readers.
 */
export function SortHeaderLink({
  label,
  href,
  direction,
}: {
  label: string;
  href: string;
  direction: "asc" | "desc" | false;
}) {
  return (
    <Link
      to={href}
      preventScrollReset
      className="inline-flex items-center gap-1 font-semibold text-graphite-700 hover:text-copper-700"
    >
      {label}
      <span
        aria-hidden="true"
        className={direction ? "text-copper-600" : "text-graphite-300"}
      >
        {direction === "asc" ? "▲" : direction === "desc" ? "▼" : "↕"}
      </span>
      <span className="sr-only">
        {direction === "asc"
          ? "(sorted ascending; select to sort descending)"
          : direction === "desc"
            ? "(sorted descending; select to sort ascending)"
            : "(select to sort)"}
      </span>
    </Link>
  );
}
