import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import {
  data,
  Form,
  Link,
  redirect,
  useNavigation,
  useSearchParams,
} from "react-router";
import type { Route } from "./+types/sign-in";
import { getOptionalUser } from "~/auth/guard.server";
import { startSession } from "~/auth/session.server";
import { AccountCard } from "~/components/account-card";
import { FormMessages, TextField } from "~/components/text-field";
import {
  safeRedirectPath,
  signInRefusal,
  signInSchema,
  wrongCredentialsMessage,
} from "~/lib/account-schemas";
import { checkSignIn } from "~/people/people.server";
import { BrowserDisplayHints } from "~/components/account/browser-display-hints";
import { adoptBrowserDisplaySettings } from "~/people/display-settings.server";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getOptionalUser(request);
  if (user) {
    throw redirect(
      safeRedirectPath(new URL(request.url).searchParams.get("redirectTo")),
    );
  }
  return { constraint: getZodConstraint(signInSchema) };
}

export async function action({ request, context }: Route.ActionArgs) {
  await getOptionalUser(request); // reaches the database first: a 503 when it is down
  const formData = await request.formData();
  const submission = parseForm(formData, { schema: signInSchema });
  if (submission.status !== "success") {
    return data(submission.reply({ hideFields: ["password"] }), {
      status: 400,
    });
  }
  const { email, password, redirectTo } = submission.value;
  const result = await checkSignIn(email, password, context.clientAddress);
  if (result.kind === "paused" || result.kind === "busy") {
    const refusal = signInRefusal(result);
    return data(
      submission.reply({
        formErrors: [refusal.message],
        hideFields: ["password"],
      }),
      { status: refusal.status, headers: refusal.headers },
    );
  }
  if (result.kind === "wrong-credentials") {
    return data(
      submission.reply({
        formErrors: [wrongCredentialsMessage],
        hideFields: ["password"],
      }),
      { status: 401 },
    );
  }
  await adoptBrowserDisplaySettings(result.userId, {
    languages: String(formData.get("browserLanguages") ?? ""),
    timeZone: String(formData.get("browserTimeZone") ?? ""),
  });
  throw redirect(safeRedirectPath(redirectTo), {
    headers: { "Set-Cookie": await startSession(result.userId) },
  });
}

/** Sends the action's Retry-After (when paused or busy) with the page. */
export const headers: Route.HeadersFunction = ({ actionHeaders }) =>
  actionHeaders;

export const meta: Route.MetaFunction = () => [
  { title: "Sign in · Turnledger" },
];

export default function SignIn({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/account-schemas").then((module) => module.signInSchema),
  );
  const [form, fields] = useForm({
    lastResult: actionData,
    constraint: loaderData.constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <AccountCard title="Sign in">
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <input
          type="hidden"
          name="redirectTo"
          value={searchParams.get("redirectTo") ?? ""}
        />
        <BrowserDisplayHints />
        <TextField
          field={fields.email}
          label="E-mail"
          type="email"
          autoComplete="username"
        />
        <TextField
          field={fields.password}
          label="Password"
          type="password"
          autoComplete="current-password"
        />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Sign in
        </button>
      </Form>
      <p className="mt-4 text-sm">
        <Link
          to="/forgot-password"
          className="text-copper-700 underline underline-offset-2"
        >
          Forgotten your password?
        </Link>
      </p>
    </AccountCard>
  );
}
