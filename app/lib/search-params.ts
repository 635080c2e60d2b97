/** The query string's values, empty ones dropped (a GET form sends every field, filled or not). */
export function searchParamsObject(
  params: URLSearchParams,
): Record<string, string> {
  return Object.fromEntries(
    [...params.entries()].filter(([, value]) => value !== ""),
  );
}
