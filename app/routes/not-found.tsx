import { data } from "react-router";
import type { Route } from "./+types/not-found";

/** Any address no other route claims: a 404 (JSON under /api/). */
export async function loader({ request }: Route.LoaderArgs) {
  if (new URL(request.url).pathname.startsWith("/api/")) {
    throw Response.json(
      { error: { message: "No such API route." } },
      { status: 404 },
    );
  }
  throw data({ message: "There is nothing at this address." }, { status: 404 });
}

export async function action({ request }: Route.ActionArgs) {
  if (new URL(request.url).pathname.startsWith("/api/")) {
    throw Response.json(
      { error: { message: "No such API route." } },
      { status: 404 },
    );
  }
  throw data({ message: "There is nothing at this address." }, { status: 404 });
}

export default function NotFound() {
  return null;
}
