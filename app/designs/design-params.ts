import { idFromText } from "~/lib/search-params";

/** The design id and revision number of a route's parameters; null when they are not whole numbers ≥ 1. */
export function designParams(params: {
  designId?: string;
  revision?: string;
}): { designId: number; revision: number } | null {
  const designId = idFromText(params.designId);
  const revision =
    params.revision === undefined ? 1 : idFromText(params.revision);
  return designId !== null && revision !== null ? { designId, revision } : null;
}
