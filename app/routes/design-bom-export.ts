import { data } from "react-router";
import type { Route } from "./+types/design-bom-export";
import { requireUser } from "~/auth/guard.server";

// Placeholder while the route is being built (issue #6).
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  throw data({ message: "Not built yet." }, { status: 404 });
}
