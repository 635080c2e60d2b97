import { roleLabels, type Role } from "~/lib/roles";

/** The roles an API token acts with, as its row in the token list names them. */
export function tokenRolesText(token: {
  followsOwner: boolean;
  roles: readonly Role[];
}): string {
  return token.followsOwner
    ? "all of yours"
    : token.roles.map((role) => roleLabels[role]).join(", ");
}
