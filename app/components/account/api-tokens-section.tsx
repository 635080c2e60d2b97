import type { SubmissionResult } from "@conform-to/react";
import { Link } from "react-router";
import type { Role } from "~/lib/roles";
import { ApiTokenTable, type ApiTokenRow } from "./api-token-table";
import { NewTokenForm } from "./new-token-form";
import type { FieldConstraints } from "~/components/forms/use-browser-validation";

/** The account page's API tokens: how scripts use one, a new token shown once, the form, the list. */
export function ApiTokensSection({
  tokens,
  roles,
  lastResult,
  newToken,
  notice,
  tokenConstraint,
}: {
  tokens: ApiTokenRow[];
  roles: Role[];
  /** The token form's last answer. */
  lastResult: SubmissionResult<string[]> | null | undefined;
  /** A token just made, shown this once. */
  newToken: string | null | undefined;
  /** Why the last change of a token or a choice was refused (what went well is a flash message). */
  notice: string | null | undefined;
  /** The token form's field constraints, from the loader. */
  tokenConstraint: FieldConstraints;
}) {
  return (
    <section aria-labelledby="tokens-heading" className="space-y-4">
      <h2 id="tokens-heading" className="text-lg font-semibold">
        API tokens
      </h2>
      <p className="text-sm text-graphite-700">
        Scripts and other tools call <code>/api/v1</code> with{" "}
        <code>Authorization: Bearer &lt;token&gt;</code>. A token acts with the
        roles you give it, and never with more than you hold.{" "}
        <Link
          to="/api"
          className="font-medium text-copper-700 underline underline-offset-2 hover:text-copper-800"
        >
          The API reference
        </Link>{" "}
        lists every operation and lets you try them as yourself.
      </p>
      {newToken ? (
        <div
          role="status"
          className="rounded-md border border-ok/40 bg-ok/5 p-4 text-sm"
        >
          <p className="font-medium text-ok">
            Copy the token now: it is shown only this once.
          </p>
          <code className="mt-2 block break-all rounded bg-white p-2 text-graphite-900">
            {newToken}
          </code>
        </div>
      ) : null}
      {notice ? (
        <p role="alert" className="text-sm text-danger">
          {notice}
        </p>
      ) : null}
      <NewTokenForm
        lastResult={lastResult}
        roles={roles}
        constraint={tokenConstraint}
      />
      <ApiTokenTable tokens={tokens} />
    </section>
  );
}
