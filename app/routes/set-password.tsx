import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { passwordMinimum } from "~/lib/password-minimum";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import type { Route } from "./+types/set-password";
import {
  isPublishedDemoPassword,
  publishedDemoPasswordMessage,
} from "~/auth/demo-password.server";
import { findUsableToken } from "~/auth/email-tokens.server";
import { getOptionalUser } from "~/auth/guard.server";
import { startSession } from "~/auth/session.server";
import { AccountCard } from "~/components/account-card";
import { FormMessages, TextField } from "~/components/text-field";
import {
  newPasswordSchema,
  passwordWorkBusyMessage,
} from "~/lib/account-schemas";
import { flashHeaders } from "~/lib/flash.server";
import { setPasswordWithToken } from "~/people/people.server";

const unusableLinkMessage =
  "This link has been used or has expired. Ask for a new one from the sign-in page.";

export async function loader({ request }: Route.LoaderArgs) {
  await getOptionalUser(request);
  const token = new URL(request.url).searchParams.get("token") ?? "";
  const row = token ? await findUsableToken(token) : null;
  return {
    token,
    usable: row !== null,
    invitation: row?.purpose === "invitation",
    constraint: getZodConstraint(newPasswordSchema),
  };
}

export async function action({ request }: Route.ActionArgs) {
  await getOptionalUser(request);
  const submission = parseForm(await request.formData(), {
    schema: newPasswordSchema,
  });
  if (submission.status !== "success") {
    return data(
      submission.reply({ hideFields: ["password", "confirmPassword"] }),
      {
        status: 400,
      },
    );
  }
  const { token, password } = submission.value;
  if (isPublishedDemoPassword(password)) {
    return data(
      submission.reply({
        fieldErrors: { password: [publishedDemoPasswordMessage] },
        hideFields: ["password", "confirmPassword"],
      }),
      { status: 400 },
    );
  }
  const result = await setPasswordWithToken(token, password);
  if (result.kind === "busy") {
    return data(
      submission.reply({
        formErrors: [passwordWorkBusyMessage],
        hideFields: ["password", "confirmPassword"],
      }),
      {
        status: 503,
        headers: { "Retry-After": String(result.retryAfterSeconds) },
      },
    );
  }
  if (result.kind === "unusable") {
    return data(
      submission.reply({
        formErrors: [unusableLinkMessage],
        hideFields: ["password", "confirmPassword"],
      }),
      { status: 410 },
    );
  }
  const headers = new Headers(await flashHeaders({ code: "password-set" }));
  headers.append("Set-Cookie", await startSession(result.userId));
  throw redirect("/", { headers });
}

/** Sends the action's Retry-After (when busy) with the page. */
export const headers: Route.HeadersFunction = ({ actionHeaders }) =>
  actionHeaders;

export const meta: Route.MetaFunction = () => [
  { title: "Choose a password · Turnledger" },
];

export default function SetPassword({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/account-schemas").then((module) => module.newPasswordSchema),
  );
  const [form, fields] = useForm({
    lastResult: actionData,
    constraint: loaderData.constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  if (!loaderData.usable) {
    return (
      <AccountCard title="Link not usable">
        <p className="text-sm text-graphite-700">{unusableLinkMessage}</p>
        <p className="mt-4 text-sm">
          <Link
            to="/forgot-password"
            className="text-copper-700 underline underline-offset-2"
          >
            Ask for a new link
          </Link>
        </p>
      </AccountCard>
    );
  }
  return (
    <AccountCard
      title={
        loaderData.invitation
          ? "Welcome: choose your password"
          : "Choose a new password"
      }
    >
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <input type="hidden" name="token" value={loaderData.token} />
        <TextField
          field={fields.password}
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${passwordMinimum} characters.`}
        />
        <TextField
          field={fields.confirmPassword}
          label="The same again"
          type="password"
          autoComplete="new-password"
        />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Save password and sign in
        </button>
      </Form>
    </AccountCard>
  );
}
