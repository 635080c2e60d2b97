import { data } from "react-router";
import type { Route } from "./+types/insight";
import { requireUser } from "~/auth/guard.server";

// Placeholder while the page is being built (issue #7).
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  throw data({ message: "Not built yet." }, { status: 404 });
}

export default function Placeholder() {
  return null;
}
