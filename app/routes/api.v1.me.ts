import type { Route } from "./+types/api.v1.me";
import { requireUser } from "~/auth/guard.server";

/** GET /api/v1/me → the signed-in person: { user: { email, name, roles } }. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return Response.json({
    user: { email: user.email, name: user.name, roles: user.roles },
  });
}
