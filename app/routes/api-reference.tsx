import { Link } from "react-router";
import type { Route } from "./+types/api-reference";
import { requireUser } from "~/auth/guard.server";
import { ApiReferenceViewer } from "~/components/api-reference/api-reference-viewer";

/** The contract the page renders (routes/api.v1.openapi.ts). */
const documentUrl = "/api/v1/openapi.json";

/** GET /api: the API's reference, for anyone signed in. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return null;
}

export const meta: Route.MetaFunction = () => [
  { title: "API reference · Turnledger" },
];

const linkClass =
  "font-medium text-copper-700 underline underline-offset-2 hover:text-copper-800";

export default function ApiReference() {
  return (
    <div className="max-w-6xl space-y-6">
      <div className="space-y-3">
        <h1 className="text-2xl font-semibold">API reference</h1>
        <p className="max-w-3xl text-graphite-700">
          Every operation under <code>/api/v1</code>, with what it takes and
          what it answers. The same contract is at{" "}
          <a href={documentUrl} className={linkClass}>
            <code>{documentUrl}</code>
          </a>{" "}
          (OpenAPI 3.1) for tools that generate clients.
        </p>
        <h2 className="text-lg font-semibold">Signing in</h2>
        <ul className="max-w-3xl list-disc space-y-1 pl-5 text-graphite-700">
          <li>
            In the browser, the API uses your session: “Try it out” on this
            page calls the API as you, with your roles, and a write it sends
            really changes Turnledger’s data.
          </li>
          <li>
            Scripts send a personal token,{" "}
            <code>Authorization: Bearer &lt;token&gt;</code>, made on{" "}
            <Link to="/account#tokens-heading" className={linkClass}>
              your account page
            </Link>
            . A token acts with the roles you give it, never more than yours.
          </li>
          <li>
            Within <code>/api/v1</code> the contract only grows: new operations
            and new fields, never a removed or renamed one. How a breaking
            change would come is told in the README’s API section.
          </li>
        </ul>
      </div>
      <ApiReferenceViewer documentUrl={documentUrl} />
    </div>
  );
}
