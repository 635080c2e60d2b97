import type { Route } from "./+types/api.v1.wire-sizes";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { wireSizeQuerySchema } from "~/reference/wire-size-query";
import { listWireSizes } from "~/reference/wire-sizes.server";

/** GET /api/v1/wire-sizes?standard=AWG|IEC → the sizes with bare diameter, area and published overall diameters. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const { standard } = readSearchParams(request, wireSizeQuerySchema);
  return Response.json(await listWireSizes(standard));
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
