import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/forgot-password";
import { getOptionalUser } from "~/auth/guard.server";
import { AccountCard } from "~/components/account-card";
import { FormMessages, TextField } from "~/components/text-field";
import { forgotPasswordSchema, minutesText } from "~/lib/account-schemas";
import { appUrl } from "~/lib/app-url.server";
import { requestPasswordReset } from "~/people/people.server";

export async function loader({ request }: Route.LoaderArgs) {
  await getOptionalUser(request);
  return { constraint: getZodConstraint(forgotPasswordSchema) };
}

/** Why a request for a link was refused (the same whether or not the address has an account). */
function limitMessage(scope: "account" | "address", retryAfterSeconds: number) {
  const wait = minutesText(retryAfterSeconds);
  return scope === "account"
    ? `Several links have been sent to this address in the last hour; each works for 30 minutes. Use the newest, or ask again in ${wait}.`
    : `Too many requests for links from your network address: ask again in ${wait}.`;
}

export async function action({ request, context }: Route.ActionArgs) {
  await getOptionalUser(request);
  const submission = parseForm(await request.formData(), {
    schema: forgotPasswordSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply(), sent: false }, { status: 400 });
  }
  const outcome = await requestPasswordReset(
    submission.value.email,
    context.clientAddress,
    appUrl(),
  );
  if (outcome.kind === "limited") {
    return data(
      {
        result: submission.reply({
          formErrors: [limitMessage(outcome.scope, outcome.retryAfterSeconds)],
        }),
        sent: false,
      },
      {
        status: 429,
        headers: { "Retry-After": String(outcome.retryAfterSeconds) },
      },
    );
  }
  // The same answer whether or not the address has an account.
  return { result: submission.reply({ resetForm: true }), sent: true };
}

/** Sends the action's Retry-After (when limited) with the page. */
export const headers: Route.HeadersFunction = ({ actionHeaders }) =>
  actionHeaders;

export const meta: Route.MetaFunction = () => [
  { title: "Forgotten password · Turnledger" },
];

export default function ForgotPassword({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/account-schemas").then(
      (module) => module.forgotPasswordSchema,
    ),
  );
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: loaderData.constraint,
    shouldValidate: "onBlur",
    onValidate: validate,
  });
  return (
    <AccountCard title="Forgotten password">
      {actionData?.sent ? (
        <p
          role="status"
          className="mb-4 rounded-md bg-ok/10 px-3 py-2 text-sm text-ok"
        >
          If that address has an account, a link to choose a new password is on
          its way. It works once, for 30 minutes.
        </p>
      ) : null}
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField
          field={fields.email}
          label="E-mail"
          type="email"
          autoComplete="username"
        />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Send me a link
        </button>
      </Form>
      <p className="mt-4 text-sm">
        <Link
          to="/sign-in"
          className="text-copper-700 underline underline-offset-2"
        >
          Back to sign-in
        </Link>
      </p>
    </AccountCard>
  );
}
