import type { Route } from "./+types/api.v1.locations";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { listLocations } from "~/stock/items.server";

/** GET /api/v1/locations → [{ code, name }]. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const locations = await listLocations();
  return Response.json(locations.map(({ code, name }) => ({ code, name })));
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
