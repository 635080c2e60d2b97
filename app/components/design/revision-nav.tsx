import { Link } from "react-router";
import type { DesignPageData } from "~/designs/design-page.server";

/** Every revision of the design, oldest first, the one shown marked as the current page. */
export function RevisionNav({
  designId,
  current,
  revisions,
  query,
}: {
  designId: number;
  /** The revision shown. */
  current: number;
  revisions: DesignPageData["revisions"];
  /** The cost query as a search string, kept when moving to another revision. */
  query: string;
}) {
  return (
    <nav
      aria-label="Revisions"
      className="flex flex-wrap items-center gap-2 text-sm print:hidden"
    >
      <span className="text-graphite-500">Revisions:</span>
      {[...revisions].reverse().map((other) =>
        other.revision === current ? (
          <span
            key={other.revision}
            aria-current="page"
            className="rounded-md bg-graphite-800 px-2 py-0.5 font-medium text-white"
          >
            {other.revision} · {other.status}
          </span>
        ) : (
          <Link
            key={other.revision}
            to={`/designs/${designId}/revisions/${other.revision}${query}`}
            className="rounded-md border border-graphite-300 px-2 py-0.5 text-copper-700 hover:border-copper-500"
          >
            {other.revision} · {other.status}
          </Link>
        ),
      )}
    </nav>
  );
}
