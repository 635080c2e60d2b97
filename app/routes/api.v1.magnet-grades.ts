import type { Route } from "./+types/api.v1.magnet-grades";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { listMagnetGrades } from "~/reference/magnet-grades.server";

/** GET /api/v1/magnet-grades → every grade with its properties and source. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return Response.json(await listMagnetGrades());
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
