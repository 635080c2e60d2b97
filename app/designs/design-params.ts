/** The design id and revision number of a route's parameters; null when they are not whole numbers ≥ 1. */
export function designParams(params: {
  designId?: string;
  revision?: string;
}): { designId: number; revision: number } | null {
  const designId = Number(params.designId);
  const revision = params.revision === undefined ? 1 : Number(params.revision);
  const valid = (value: number) =>
    Number.isSafeInteger(value) && value >= 1 && value <= 2_000_000_000;
  return valid(designId) && valid(revision) ? { designId, revision } : null;
}
