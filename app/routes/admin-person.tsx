import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/admin-person";
import { createEmailToken } from "~/auth/email-tokens.server";
import { requireCapability } from "~/auth/guard.server";
import { ConfirmButton } from "~/components/confirm-button";
import { RoleCheckboxes } from "~/components/role-checkboxes";
import { FormMessages } from "~/components/text-field";
import { appUrl } from "~/lib/app-url.server";
import { redirectWithFlash } from "~/lib/flash.server";
import { personUpdateSchema } from "~/lib/people-schemas";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { invitationMessage } from "~/mail/account-messages";
import { sendMail } from "~/mail/mailer.server";
import {
  countActiveAdmins,
  findPerson,
  setActive,
  setRoles,
} from "~/people/people.server";
import { BackLink } from "~/components/back-link";

export async function loader({ request, params }: Route.LoaderArgs) {
  const admin = await requireCapability(request, "managePeople");
  const person = await findPerson(params.userId);
  if (!person) throw data({ message: "No such person." }, { status: 404 });
  return {
    person,
    isSelf: person.id === admin.id,
    constraint: getZodConstraint(personUpdateSchema),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const admin = await requireCapability(request, "managePeople");
  const person = await findPerson(params.userId);
  if (!person) throw data({ message: "No such person." }, { status: 404 });
  const submission = parseForm(await request.formData(), {
    schema: personUpdateSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  const refuse = (message: string) =>
    data(
      { result: submission.reply({ formErrors: [message] }) },
      { status: 409 },
    );
  const change = submission.value;
  const wouldLoseAdmin =
    person.active &&
    person.roles.includes("admin") &&
    (change.intent === "deactivate" ||
      (change.intent === "save-roles" && !change.roles.includes("admin")));
  if (wouldLoseAdmin && (await countActiveAdmins()) <= 1) {
    return refuse(
      "Turnledger needs at least one active admin: make someone else admin first.",
    );
  }
  if (change.intent === "deactivate" && person.id === admin.id) {
    return refuse("You cannot deactivate yourself.");
  }

  const here = `/admin/people/${encodeURIComponent(person.id)}`;
  switch (change.intent) {
    case "save-roles":
      await setRoles(person.id, change.roles);
      return redirectWithFlash(here, {
        code: "person-roles-saved",
        id: person.id,
      });
    case "deactivate":
      await setActive(person.id, false);
      return redirectWithFlash(here, {
        code: "person-deactivated",
        id: person.id,
      });
    case "reactivate":
      await setActive(person.id, true);
      return redirectWithFlash(here, {
        code: "person-reactivated",
        id: person.id,
      });
    case "resend-invitation": {
      const token = await createEmailToken(person.id, "invitation");
      const sent = await sendMail({
        to: person.email,
        ...invitationMessage({
          name: person.name,
          invitedBy: admin.name,
          link: `${appUrl()}/set-password?token=${token}`,
        }),
      });
      return redirectWithFlash(here, {
        code: sent ? "invitation-resent" : "invitation-waiting",
        id: person.id,
      });
    }
  }
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  { title: `${loaderData?.person.name ?? "Person"} · People · Turnledger` },
];

export default function AdminPerson({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { person, isSelf, constraint } = loaderData;
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/people-schemas").then((module) => module.personUpdateSchema),
  );
  const [form, fields] = useForm({
    id: `roles-${person.id}`,
    lastResult: actionData?.result,
    defaultValue: { intent: "save-roles", roles: person.roles },
    constraint,
    shouldValidate: "onSubmit",
    onValidate: validate,
  });
  return (
    <div className="max-w-2xl space-y-6">
      <p className="text-sm">
        <BackLink to="/admin/people">People</BackLink>
      </p>
      <div>
        <h1 className="text-2xl font-semibold">{person.name}</h1>
        <p className="text-graphite-500">
          {person.email} · {person.active ? "active" : "deactivated"}
        </p>
      </div>
      <FormMessages id={form.errorId} errors={form.errors} />
      <Form method="post" {...getFormProps(form)} className="panel space-y-4">
        <RoleCheckboxes field={fields.roles} legend="Roles" />
        <p className="text-sm text-graphite-700">
          Saving new roles signs {isSelf ? "you" : "them"} out everywhere and
          revokes {isSelf ? "your" : "their"} API tokens.
        </p>
        <button
          type="submit"
          name="intent"
          value="save-roles"
          className="button-primary"
          disabled={navigation.state !== "idle"}
        >
          Save roles
        </button>
      </Form>
      <Form method="post" className="panel flex flex-wrap items-center gap-3">
        {person.active ? (
          <>
            <p className="flex-1 text-sm text-graphite-700">
              Deactivating ends {isSelf ? "your" : "their"} sessions and revokes{" "}
              {isSelf ? "your" : "their"} API tokens at once; the history they
              made stays.
            </p>
            <ConfirmButton
              name="intent"
              value="deactivate"
              className="button-quiet text-danger"
              disabled={isSelf}
              question={{
                title: `Deactivate ${person.name}?`,
                consequence: (
                  <p>
                    {person.name} is signed out everywhere at once, their API
                    tokens are revoked for good and they can no longer sign in.
                    What they recorded stays. An admin can reactivate them
                    later, but the tokens stay revoked.
                  </p>
                ),
                confirmLabel: `Deactivate ${person.name}`,
                keepLabel: "Keep them active",
              }}
            >
              Deactivate
            </ConfirmButton>
          </>
        ) : (
          <>
            <p className="flex-1 text-sm text-graphite-700">
              This person cannot sign in.
            </p>
            <button
              type="submit"
              name="intent"
              value="reactivate"
              className="button-quiet"
            >
              Reactivate
            </button>
          </>
        )}
        <button
          type="submit"
          name="intent"
          value="resend-invitation"
          className="button-quiet"
        >
          Send a new invitation link
        </button>
      </Form>
    </div>
  );
}
