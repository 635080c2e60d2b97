/**
 * The typed client of /api/v1 for the app's own pages (openapi-fetch over the types that
 * `npm run api:contract` generates from the contract into ./schema.d.ts): same origin, with
 * the person's session cookie. A path, body or answer that drifts from the contract is a
 * type error. Scripts make their own client the same way with a bearer token (README).
 */
import createClient from "openapi-fetch";
import type { components, paths } from "./schema";

export const apiClient = createClient<paths>({
  credentials: "same-origin",
  headers: { Accept: "application/json" },
});

/** A schema of the contract by its name (components.schemas), e.g. ApiSchema<"CoilEstimate">. */
export type ApiSchema<Name extends keyof components["schemas"]> =
  components["schemas"][Name];

/** The JSON body an operation of the contract takes, by path and method. */
export type ApiRequestBody<
  Path extends keyof paths,
  Method extends "post" | "patch" | "put",
> = paths[Path][Method] extends {
  requestBody?: { content: { "application/json": infer Body } };
}
  ? Body
  : never;
