import { getFormProps, getSelectProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/account";
import {
  createApiToken,
  listApiTokens,
  revokeApiToken,
} from "~/auth/api-tokens.server";
import { requireUser } from "~/auth/guard.server";
import { changePasswordAction } from "~/components/account/change-password-action.server";
import { ChangePasswordForm } from "~/components/account/change-password-form";
import { RoleCheckboxes } from "~/components/role-checkboxes";
import { FormMessages, TextField } from "~/components/text-field";
import { formatDateTime } from "~/lib/format";
import { roleLabels, userHasRole } from "~/lib/roles";
import {
  alertPreferenceOf,
  setAlertPreference,
} from "~/alerts/alert-preferences.server";
import { alertModeOf } from "~/alerts/low-stock";
import { alertMailModes } from "~/db/tables/alert-enums";
import { signInRefusal } from "~/lib/account-schemas";
import {
  createTokenSchema,
  lifetimeAllowed,
  lifetimeTooLongMessage,
  tokenExpiry,
} from "~/lib/token-schemas";
import { checkSignIn } from "~/people/people.server";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const hearsAlerts = userHasRole(user, ["buyer"]);
  return {
    user,
    tokens: await listApiTokens(user.id),
    alertMode: hearsAlerts
      ? alertModeOf({
          ...user,
          mode: await alertPreferenceOf(user.id),
        })
      : null,
  };
}

const alertModeSchema = z.object({
  mode: z.enum(alertMailModes, {
    error: "Choose each alert, a daily digest or none.",
  }),
});

const revokeSchema = z.object({ tokenId: z.coerce.number().int().positive() });

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requireUser(request);
  const formData = await request.formData();
  if (formData.get("intent") === "change-password")
    return changePasswordAction({
      formData,
      user,
      clientAddress: context.clientAddress,
    });
  if (formData.get("intent") === "alert-mode") {
    // Buyers (and admins, who opt in) choose how they hear about low stock.
    if (!userHasRole(user, ["buyer"]))
      return data(
        {
          result: null,
          newToken: null,
          notice: "Only buyers and admins get low-stock e-mails.",
        },
        { status: 403 },
      );
    const parsed = alertModeSchema.safeParse({ mode: formData.get("mode") });
    if (!parsed.success)
      return data(
        {
          result: null,
          newToken: null,
          notice: parsed.error.issues[0]!.message,
        },
        { status: 400 },
      );
    await setAlertPreference(user.id, parsed.data.mode);
    return {
      result: null,
      newToken: null,
      notice: "Low-stock e-mail choice saved.",
    };
  }
  if (formData.get("intent") === "revoke") {
    const parsed = revokeSchema.safeParse({ tokenId: formData.get("tokenId") });
    if (
      !parsed.success ||
      !(await revokeApiToken(user.id, parsed.data.tokenId))
    ) {
      return data(
        { result: null, newToken: null, notice: "No such live token." },
        { status: 404 },
      );
    }
    return {
      result: null,
      newToken: null,
      notice: "Token revoked: it no longer works.",
    };
  }
  const submission = parseWithZod(formData, {
    schema: createTokenSchema
      .refine(
        (value) =>
          value.scope === "all" ||
          value.roles.every((role) => user.roles.includes(role)),
        {
          path: ["roles"],
          message: "A token can only have roles you hold yourself.",
        },
      )
      .refine(
        (value) =>
          lifetimeAllowed(value.lifetimeDays, user.roles.includes("admin")),
        { path: ["lifetimeDays"], message: lifetimeTooLongMessage },
      ),
  });
  const hideFields = ["currentPassword"];
  if (submission.status !== "success") {
    return data(
      {
        result: submission.reply({ hideFields }),
        newToken: null,
        notice: null,
      },
      { status: 400 },
    );
  }
  // The password again, under the sign-in throttle: a session left open is
  // not enough to make a token that outlives it.
  const check = await checkSignIn(
    user.email,
    submission.value.currentPassword,
    context.clientAddress,
  );
  if (check.kind !== "signed-in") {
    const refusal =
      check.kind === "wrong-credentials"
        ? { status: 400, message: "Your password is wrong.", headers: {} }
        : signInRefusal(check);
    return data(
      {
        result: submission.reply({
          fieldErrors: { currentPassword: [refusal.message] },
          hideFields,
        }),
        newToken: null,
        notice: null,
      },
      { status: refusal.status, headers: refusal.headers },
    );
  }
  const { token } = await createApiToken({
    userId: user.id,
    name: submission.value.name,
    roles: submission.value.scope === "all" ? null : submission.value.roles,
    expiresAt: tokenExpiry(submission.value.lifetimeDays),
  });
  return {
    result: submission.reply({ resetForm: true }),
    newToken: token,
    notice: null,
  };
}

/** Sends an action's Retry-After (sign-in paused, or the password queue busy) with the page. */
export const headers: Route.HeadersFunction = ({ actionHeaders }) =>
  actionHeaders;

export const meta: Route.MetaFunction = () => [
  { title: "Your account · Turnledger" },
];

export default function Account({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { user, tokens, alertMode } = loaderData;
  const navigation = useNavigation();
  const [form, fields] = useForm({
    id: "new-token",
    lastResult: actionData?.result,
    defaultValue: { scope: "all", roles: user.roles, lifetimeDays: "90" },
    constraint: getZodConstraint(createTokenSchema),
    shouldValidate: "onBlur",
    onValidate({ formData }) {
      return parseWithZod(formData, { schema: createTokenSchema });
    },
  });
  const { key: selectKey, ...selectProps } = getSelectProps(
    fields.lifetimeDays,
    { ariaDescribedBy: fields.lifetimeDays.descriptionId },
  );
  const isAdmin = user.roles.includes("admin");
  const passwordResult =
    actionData && "passwordResult" in actionData
      ? actionData.passwordResult
      : null;
  return (
    <div className="max-w-4xl space-y-8">
      <div>
        <h1 className="text-2xl font-semibold">Your account</h1>
        <p className="text-graphite-500">
          {user.name} · {user.email} ·{" "}
          {user.roles.map((role) => roleLabels[role]).join(", ") || "no role"}
        </p>
      </div>

      <ChangePasswordForm
        lastResult={passwordResult}
        liveTokens={tokens.filter((token) => !token.revokedAt).length}
      />

      {alertMode ? (
        <section aria-labelledby="alerts-heading" className="space-y-3">
          <h2 id="alerts-heading" className="text-lg font-semibold">
            Low-stock e-mails
          </h2>
          <Form method="post" className="space-y-2">
            <input type="hidden" name="intent" value="alert-mode" />
            <fieldset className="space-y-1 text-sm">
              <legend className="mb-1 text-graphite-700">
                When an item falls below its reorder point, tell me:
              </legend>
              {(
                [
                  ["each", "by e-mail, for each new alert"],
                  ["digest", "once a day, in a digest of every open alert"],
                  ["none", "not by e-mail (I read the Alerts page)"],
                ] as const
              ).map(([mode, label]) => (
                <label key={mode} className="flex items-center gap-2">
                  <input
                    type="radio"
                    name="mode"
                    value={mode}
                    defaultChecked={alertMode === mode}
                  />
                  {label}
                </label>
              ))}
            </fieldset>
            <button type="submit" className="button-quiet">
              Save
            </button>
          </Form>
        </section>
      ) : null}

      <section aria-labelledby="tokens-heading" className="space-y-4">
        <h2 id="tokens-heading" className="text-lg font-semibold">
          API tokens
        </h2>
        <p className="text-sm text-graphite-700">
          Scripts and other tools call <code>/api/v1</code> with{" "}
          <code>Authorization: Bearer &lt;token&gt;</code>. A token acts with
          the roles you give it, and never with more than you hold.
        </p>
        {actionData?.newToken ? (
          <div
            role="status"
            className="rounded-md border border-ok/40 bg-ok/5 p-4 text-sm"
          >
            <p className="font-medium text-ok">
              Copy the token now: it is shown only this once.
            </p>
            <code className="mt-2 block break-all rounded bg-white p-2 text-graphite-900">
              {actionData.newToken}
            </code>
          </div>
        ) : null}
        {actionData?.notice ? (
          <p role="status" className="text-sm text-graphite-700">
            {actionData.notice}
          </p>
        ) : null}
        <Form
          method="post"
          {...getFormProps(form)}
          className="panel grid gap-4 md:grid-cols-2"
        >
          <FormMessages id={form.errorId} errors={form.errors} />
          <TextField
            field={fields.name}
            label="Token name"
            autoComplete="off"
            hint="e.g. the scale at the winding bench"
          />
          <div>
            <label htmlFor={fields.lifetimeDays.id} className="field-label">
              Lives for
            </label>
            <select key={selectKey} {...selectProps} className="field-input">
              <option value="30">30 days</option>
              <option value="90">90 days</option>
              <option value="365">a year</option>
              {isAdmin ? <option value="never">until revoked</option> : null}
            </select>
            <p
              id={fields.lifetimeDays.descriptionId}
              className="mt-1 text-xs text-graphite-500"
            >
              {isAdmin
                ? "A year at most, or until revoked for an admin's own tokens."
                : "A year at most."}
            </p>
            {fields.lifetimeDays.errors ? (
              <p id={fields.lifetimeDays.errorId} className="field-error">
                {fields.lifetimeDays.errors.join(" ")}
              </p>
            ) : null}
          </div>
          <TextField
            field={fields.currentPassword}
            label="Your password"
            type="password"
            autoComplete="current-password"
            hint="Asked again before a token is made."
          />
          <fieldset className="space-y-3 md:col-span-2">
            <legend className="field-label">Roles the token acts with</legend>
            <label className="flex items-center gap-2 text-sm">
              <input
                type="radio"
                name={fields.scope.name}
                value="all"
                defaultChecked
                className="h-4 w-4 accent-copper-600"
              />
              All my roles, as they are each time it is used
            </label>
            <label className="flex items-center gap-2 text-sm">
              <input
                type="radio"
                name={fields.scope.name}
                value="chosen"
                className="h-4 w-4 accent-copper-600"
              />
              Only the roles ticked below (never more than I hold)
            </label>
            <RoleCheckboxes
              field={fields.roles}
              legend="Roles for “only these”"
              choices={user.roles}
            />
          </fieldset>
          <div>
            <button
              type="submit"
              name="intent"
              value="create"
              className="button-primary"
              disabled={navigation.state !== "idle"}
            >
              Create token
            </button>
          </div>
        </Form>
        <div className="panel overflow-x-auto p-0">
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
                  <td
                    colSpan={7}
                    className="py-6 text-center text-graphite-500"
                  >
                    No tokens yet.
                  </td>
                </tr>
              ) : (
                tokens.map((token) => (
                  <tr
                    key={token.id}
                    className={
                      token.revokedAt
                        ? "text-graphite-500 line-through"
                        : undefined
                    }
                  >
                    <td>{token.name}</td>
                    <td>
                      <code>{token.tokenPrefix}…</code>
                    </td>
                    <td>
                      {token.followsOwner
                        ? "all of yours"
                        : token.roles
                            .map((role) => roleLabels[role])
                            .join(", ")}
                    </td>
                    <td>{formatDateTime(token.createdAt)}</td>
                    <td>
                      {token.expiresAt
                        ? formatDateTime(token.expiresAt)
                        : "never"}
                    </td>
                    <td>{formatDateTime(token.lastUsedAt)}</td>
                    <td>
                      {token.revokedAt ? (
                        "revoked"
                      ) : (
                        <Form method="post">
                          <input
                            type="hidden"
                            name="tokenId"
                            value={token.id}
                          />
                          <button
                            type="submit"
                            name="intent"
                            value="revoke"
                            className="button-quiet"
                            aria-label={`Revoke ${token.name}`}
                          >
                            Revoke
                          </button>
                        </Form>
                      )}
                    </td>
                  </tr>
                ))
              )}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}
