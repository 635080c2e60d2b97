import { Link } from "react-router";

/** The link back up to the page a page belongs to ("← Stock"); a full-size touch target on phones and touch screens. */
export function BackLink({
  to,
  children,
}: {
  to: string;
  children: React.ReactNode;
}) {
  return (
    <Link
      to={to}
      className="text-copper-700 underline underline-offset-2 touch:inline-flex touch:min-h-11 touch:items-center"
    >
      ← {children}
    </Link>
  );
}
