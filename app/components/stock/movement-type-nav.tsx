/**
 * The record-movement page's choice of kind (receipt, issue, …): one link per kind, the
 * chosen one marked, each keeping the item found.
 */
import { Link } from "react-router";
import { movementTypes, type MovementType } from "~/db/tables/stock-enums";
import { recordMovementSearch } from "~/stock/record-movement-texts";
import { movementTypeLabels } from "~/stock/stock-quantity-text";

export function MovementTypeNav({
  type,
  sku,
}: {
  type: MovementType;
  sku: string;
}) {
  return (
    <nav aria-label="Movement type">
      <ul className="flex flex-wrap gap-2">
        {movementTypes.map((candidate) => (
          <li key={candidate}>
            <Link
              to={recordMovementSearch(candidate, sku)}
              aria-current={candidate === type ? "page" : undefined}
              className={`inline-flex min-h-11 items-center rounded-md border px-4 text-sm font-medium ${
                candidate === type
                  ? "border-copper-600 bg-copper-600 text-white"
                  : "border-graphite-300 bg-sheet text-graphite-800 hover:border-graphite-500"
              }`}
            >
              {movementTypeLabels[candidate]}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
