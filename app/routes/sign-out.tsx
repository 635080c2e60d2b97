import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { getOptionalUser } from "~/auth/guard.server";
import { endSession } from "~/auth/session.server";

// Signing out is a POST (from the app shell's button); a GET just goes home.
export async function loader({ request }: Route.LoaderArgs) {
  await getOptionalUser(request);
  return redirect("/");
}

export async function action({ request }: Route.ActionArgs) {
  await getOptionalUser(request);
  return redirect("/sign-in", {
    headers: { "Set-Cookie": await endSession(request) },
  });
}
