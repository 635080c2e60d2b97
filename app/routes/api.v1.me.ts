import type { Route } from "./+types/api.v1.me";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";

/** GET /api/v1/me → the signed-in person: { user: { email, name, roles } }. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return Response.json({
    user: { email: user.email, name: user.name, roles: user.roles },
  });
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
