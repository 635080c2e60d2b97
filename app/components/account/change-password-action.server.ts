/**
 * The account page's answer to its change-password form: field messages with
 * 400 for a new password the rules refuse (the set-password rules, the demo
 * password included) and for a wrong current password; 429 or 503 when the
 * sign-in throttle or the password queue refuses to check; after a change, a
 * redirect to the account page with a new session cookie and a one-time note.
 */
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import {
  isPublishedDemoPassword,
  publishedDemoPasswordMessage,
} from "~/auth/demo-password.server";
import { changePasswordSchema, signInRefusal } from "~/lib/account-schemas";
import { redirectWithFlash } from "~/lib/flash.server";
import { changeOwnPassword } from "~/people/change-password.server";

/** Passwords are never sent back into the form. */
const hideFields = ["currentPassword", "password", "confirmPassword"];

/** The page's other forms' answers are empty (their shape, so the page reads one type). */
const otherForms = { result: null, newToken: null, notice: null };

export async function changePasswordAction(input: {
  formData: FormData;
  user: { id: string; email: string };
  clientAddress: string;
}) {
  const submission = parseForm(input.formData, {
    schema: changePasswordSchema,
  });
  const refuse = (
    status: number,
    fieldErrors: Record<string, string[]>,
    headers: Record<string, string> = {},
  ) =>
    data(
      {
        ...otherForms,
        passwordResult: submission.reply({ fieldErrors, hideFields }),
      },
      { status, headers },
    );
  if (submission.status !== "success")
    return data(
      { ...otherForms, passwordResult: submission.reply({ hideFields }) },
      { status: 400 },
    );
  const { currentPassword, password } = submission.value;
  // Refused before the current password is checked, so it costs no guess.
  if (isPublishedDemoPassword(password))
    return refuse(400, { password: [publishedDemoPasswordMessage] });

  const change = await changeOwnPassword({
    user: input.user,
    currentPassword,
    newPassword: password,
    clientAddress: input.clientAddress,
  });
  if (change.kind === "wrong-current-password")
    return refuse(400, {
      currentPassword: ["Your current password is wrong."],
    });
  if (change.kind !== "changed") {
    const refusal = signInRefusal(change);
    return refuse(
      refusal.status,
      { currentPassword: [refusal.message] },
      refusal.headers,
    );
  }
  const answer = await redirectWithFlash("/account", {
    code: "password-changed",
  });
  answer.headers.append("Set-Cookie", change.setCookie);
  return answer;
}
