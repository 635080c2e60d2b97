import type { Route } from "./+types/api.v1.sessions";
import { getOptionalUser } from "~/auth/guard.server";
import { endSession, startSession } from "~/auth/session.server";
import {
  sessionCredentialsSchema,
  signInRefusal,
  wrongCredentialsMessage,
} from "~/lib/account-schemas";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { findPerson, checkSignIn } from "~/people/people.server";

export async function loader({ request }: Route.LoaderArgs) {
  await getOptionalUser(request);
  return methodNotAllowed(["POST", "DELETE"]);
}

/** POST signs in (JSON { email, password }); DELETE signs out. */
export async function action({ request, context }: Route.ActionArgs) {
  await getOptionalUser(request); // a 503 when the database is down
  if (request.method === "DELETE") {
    return new Response(null, {
      status: 204,
      headers: { "Set-Cookie": await endSession(request) },
    });
  }
  if (request.method !== "POST") return methodNotAllowed(["POST", "DELETE"]);

  const { email, password } = await readJsonBody(
    request,
    sessionCredentialsSchema,
  );
  const result = await checkSignIn(email, password, context.clientAddress);
  if (result.kind === "paused" || result.kind === "busy") {
    const refusal = signInRefusal(result);
    return apiError(
      refusal.status,
      refusal.message,
      undefined,
      refusal.headers,
    );
  }
  if (result.kind === "wrong-credentials")
    return apiError(401, wrongCredentialsMessage);
  const person = await findPerson(result.userId);
  return Response.json(
    {
      user: {
        email: person?.email,
        name: person?.name,
        roles: person?.roles ?? [],
      },
    },
    { headers: { "Set-Cookie": await startSession(result.userId) } },
  );
}
