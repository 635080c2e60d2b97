import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/forgot-password";
import { getOptionalUser } from "~/auth/guard.server";
import { AccountCard } from "~/components/account-card";
import { TextField } from "~/components/text-field";
import { forgotPasswordSchema } from "~/lib/account-schemas";
import { appUrl } from "~/lib/app-url.server";
import { requestPasswordReset } from "~/people/people.server";

export async function loader({ request }: Route.LoaderArgs) {
  await getOptionalUser(request);
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  await getOptionalUser(request);
  const submission = parseWithZod(await request.formData(), {
    schema: forgotPasswordSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply(), sent: false }, { status: 400 });
  }
  await requestPasswordReset(submission.value.email, appUrl());
  // The same answer whether or not the address has an account.
  return { result: submission.reply({ resetForm: true }), sent: true };
}

export const meta: Route.MetaFunction = () => [
  { title: "Forgotten password · Turnledger" },
];

export default function ForgotPassword({ actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(forgotPasswordSchema),
    shouldValidate: "onBlur",
    onValidate({ formData }) {
      return parseWithZod(formData, { schema: forgotPasswordSchema });
    },
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
