import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/account";
import {
  createApiToken,
  listApiTokens,
  revokeApiToken,
} from "~/auth/api-tokens.server";
import { requireUser } from "~/auth/guard.server";
import { ApiTokensSection } from "~/components/account/api-tokens-section";
import { changePasswordAction } from "~/components/account/change-password-action.server";
import { ChangePasswordForm } from "~/components/account/change-password-form";
import { LowStockMailChoice } from "~/components/account/low-stock-mail-choice";
import { userCan } from "~/lib/capabilities";
import { redirectWithFlash } from "~/lib/flash.server";
import { roleLabels } from "~/lib/roles";
import {
  alertPreferenceOf,
  setAlertPreference,
} from "~/alerts/alert-preferences.server";
import { alertModeOf } from "~/alerts/low-stock";
import { alertMailModes } from "~/db/tables/alert-enums";
import { changePasswordSchema, signInRefusal } from "~/lib/account-schemas";
import {
  createTokenSchema,
  lifetimeAllowed,
  lifetimeTooLongMessage,
  tokenExpiry,
} from "~/lib/token-schemas";
import { checkSignIn } from "~/people/people.server";
import { DisplaySettingsForm } from "~/components/account/display-settings-form";
import { displaySettingsOf } from "~/lib/display-settings";
import {
  displaySettingsSchema,
  timeZoneChoices,
} from "~/people/display-settings-form";
import { saveDisplaySettings } from "~/people/display-settings.server";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const hearsAlerts = userCan(user, "hearLowStockAlerts");
  return {
    user,
    display: displaySettingsOf(user),
    timeZones: timeZoneChoices(),
    tokens: await listApiTokens(user.id),
    alertMode: hearsAlerts
      ? alertModeOf({
          ...user,
          mode: await alertPreferenceOf(user.id),
        })
      : null,
    // The forms' field constraints; their checks load after hydration (useBrowserValidation).
    constraints: {
      password: getZodConstraint(changePasswordSchema),
      display: getZodConstraint(displaySettingsSchema),
      token: getZodConstraint(createTokenSchema),
    },
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
  if (formData.get("intent") === "display-settings") {
    const submission = parseForm(formData, {
      schema: displaySettingsSchema,
    });
    if (submission.status !== "success")
      return data(
        {
          displayResult: submission.reply(),
          result: null,
          newToken: null,
          notice: null,
        },
        { status: 400 },
      );
    await saveDisplaySettings(user.id, submission.value);
    return redirectWithFlash("/account", { code: "display-settings-saved" });
  }
  if (formData.get("intent") === "alert-mode") {
    // Buyers (and admins, who opt in) choose how they hear about low stock.
    if (!userCan(user, "hearLowStockAlerts"))
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
    return redirectWithFlash("/account", { code: "alert-mail-saved" });
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
    return redirectWithFlash("/account", { code: "token-revoked" });
  }
  const submission = parseForm(formData, {
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
  const { user, tokens, alertMode, display, timeZones, constraints } =
    loaderData;
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
        constraint={constraints.password}
      />

      <DisplaySettingsForm
        settings={display}
        timeZones={timeZones}
        constraint={constraints.display}
        lastResult={
          actionData && "displayResult" in actionData
            ? actionData.displayResult
            : null
        }
      />

      {alertMode ? <LowStockMailChoice alertMode={alertMode} /> : null}

      <ApiTokensSection
        tokens={tokens}
        roles={user.roles}
        lastResult={actionData?.result}
        newToken={actionData?.newToken}
        notice={actionData?.notice}
        tokenConstraint={constraints.token}
      />
    </div>
  );
}
