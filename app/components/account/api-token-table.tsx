import { Form } from "react-router";
import type { listApiTokens } from "~/auth/api-tokens.server";
import { ConfirmButton } from "~/components/confirm-button";
import { formatDateTime } from "~/lib/format";
import { tokenRolesText } from "./token-roles-text";
import { TableScroll } from "~/components/table-scroll";

export type ApiTokenRow = Awaited<ReturnType<typeof listApiTokens>>[number];

/** The person's API tokens, newest first; a live one can be revoked, a revoked one is struck through. */
export function ApiTokenTable({ tokens }: { tokens: ApiTokenRow[] }) {
  return (
    <TableScroll label="Your API tokens" className="panel p-0">
      <table className="data-table">
        <caption className="sr-only">Your API tokens</caption>
        <thead>
          <tr>
            <th scope="col">Name</th>
            <th scope="col">Starts with</th>
            <th scope="col">Roles</th>
            <th scope="col">Created</th>
            <th scope="col">Expires</th>
            <th scope="col">Last used</th>
            <th scope="col">
              <span className="sr-only">Revoke</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {tokens.length === 0 ? (
            <tr>
              <td colSpan={7} className="py-6 text-center text-graphite-500">
                No tokens yet.
              </td>
            </tr>
          ) : (
            tokens.map((token) => (
              <tr
                key={token.id}
                className={
                  token.revokedAt ? "text-graphite-500 line-through" : undefined
                }
              >
                <td>{token.name}</td>
                <td>
                  <code>{token.tokenPrefix}…</code>
                </td>
                <td>{tokenRolesText(token)}</td>
                <td>{formatDateTime(token.createdAt)}</td>
                <td>
                  {token.expiresAt ? formatDateTime(token.expiresAt) : "never"}
                </td>
                <td>{formatDateTime(token.lastUsedAt)}</td>
                <td>
                  {token.revokedAt ? (
                    "revoked"
                  ) : (
                    <Form method="post">
                      <input type="hidden" name="tokenId" value={token.id} />
                      <ConfirmButton
                        name="intent"
                        value="revoke"
                        className="button-quiet"
                        aria-label={`Revoke ${token.name}`}
                        question={{
                          title: `Revoke the token ${token.name}?`,
                          consequence: (
                            <p>
                              Scripts that use the token starting with{" "}
                              <code>{token.tokenPrefix}…</code> are refused from
                              now on. A revoked token cannot be brought back:
                              make a new one if you need it again.
                            </p>
                          ),
                          confirmLabel: "Revoke the token",
                          keepLabel: "Keep it",
                        }}
                      >
                        Revoke
                      </ConfirmButton>
                    </Form>
                  )}
                </td>
              </tr>
            ))
          )}
        </tbody>
      </table>
    </TableScroll>
  );
}
