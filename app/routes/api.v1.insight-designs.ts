import { data } from "react-router";
import type { Route } from "./+types/api.v1.insight-designs";
import { requireUser } from "~/auth/guard.server";

// Placeholder while the route is being built (issue #7).
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  throw data({ message: "Not built yet." }, { status: 404 });
}
