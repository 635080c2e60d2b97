import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { createColumnHelper } from "~/lib/table-columns";
import { data, Form, Link, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/admin-people";
import { requireCapability } from "~/auth/guard.server";
import { isDuplicateKey } from "~/db/database-errors";
import { DataTable } from "~/components/data-table";
import { useFlash } from "~/components/flash-message";
import {
  FilterChoice,
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { RoleCheckboxes } from "~/components/role-checkboxes";
import { FormMessages, TextField } from "~/components/text-field";
import { appUrl } from "~/lib/app-url.server";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatDateTime } from "~/lib/format";
import { readPageOrLast } from "~/lib/search-params";
import {
  isFiltered,
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { inviteSchema } from "~/lib/people-schemas";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { roleLabels, roles } from "~/lib/roles";
import {
  emailIsTaken,
  invitePerson,
  listPeople,
  peoplePageSize,
} from "~/people/people.server";

const peopleListSchema = searchPageSchema.extend({
  role: z
    .enum(roles, { error: `role must be one of ${roles.join(", ")}.` })
    .optional(),
});

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "managePeople");
  const { query, ignored } = readListFilters(
    peopleListSchema,
    new URL(request.url).searchParams,
  );
  const { page: asked, ...filter } = query;
  const { people, page, pageCount } = await readPageOrLast(
    asked,
    peoplePageSize,
    (page) => listPeople(page, filter),
  );
  return {
    people,
    page,
    pageCount,
    filter,
    ignored,
    constraint: getZodConstraint(inviteSchema),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const admin = await requireCapability(request, "managePeople");
  const submission = await parseForm(await request.formData(), {
    schema: inviteSchema.superRefine(async (value, context) => {
      if (await emailIsTaken(value.email)) {
        context.addIssue({
          code: "custom",
          path: ["email"],
          message: "Someone already has an account with this e-mail.",
        });
      }
    }),
    async: true,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  let invited: { userId: string; mailSent: boolean };
  try {
    invited = await invitePerson({
      ...submission.value,
      invitedBy: admin.name,
      appUrl: appUrl(),
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    const result = submission.reply({
      fieldErrors: {
        email: ["Someone already has an account with this e-mail."],
      },
    });
    return data({ result }, { status: 409 });
  }
  return redirectWithFlash("/admin/people", {
    code: invited.mailSent ? "person-invited" : "person-invited-mail-waiting",
    id: invited.userId,
  });
}

export const meta: Route.MetaFunction = () => [
  { title: "People · Turnledger" },
];

type Person = Route.ComponentProps["loaderData"]["people"][number];
const column = createColumnHelper<Person>();
const columns = [
  column.accessor("name", {
    header: "Name",
    cell: (info) => (
      <Link
        to={`/admin/people/${info.row.original.id}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("email", { header: "E-mail" }),
  column.accessor("roles", {
    header: "Roles",
    cell: (info) =>
      info
        .getValue()
        .map((role) => roleLabels[role])
        .join(", ") || "—",
  }),
  column.display({
    id: "state",
    header: "State",
    cell: ({ row }) =>
      !row.original.active ? (
        <span className="text-danger">Deactivated</span>
      ) : row.original.hasPassword ? (
        "Active"
      ) : (
        <span className="text-caution">Invited, no password yet</span>
      ),
  }),
  column.accessor("createdAt", {
    header: "Since",
    cell: (info) => formatDateTime(info.getValue()),
  }),
];

export default function AdminPeople({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  // A new key after each invitation (its message) empties the form.
  const invited = useFlash()?.key ?? "new";
  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
      <section aria-labelledby="people-heading">
        <h1 id="people-heading" className="mb-4 text-2xl font-semibold">
          People
        </h1>
        <div className="mb-4 space-y-3">
          <ListSearchForm
            path="/admin/people"
            label="Search the people"
            search={{
              value: loaderData.filter.search,
              placeholder: "Name or e-mail",
            }}
            filtered={isFiltered(loaderData.filter)}
          >
            <FilterChoice
              name="role"
              label="Role"
              value={loaderData.filter.role}
              allLabel="Any role"
              options={roles.map((role) => ({
                value: role,
                label: roleLabels[role],
              }))}
            />
          </ListSearchForm>
          <IgnoredFilters names={loaderData.ignored} />
        </div>
        <DataTable
          caption="People with an account"
          columns={columns}
          rows={loaderData.people}
          page={loaderData.page}
          pageCount={loaderData.pageCount}
          pageHref={(page) =>
            listHref("/admin/people", { ...loaderData.filter, page })
          }
          emptyText={
            <ListEmptyText
              filtered={isFiltered(loaderData.filter)}
              clearHref="/admin/people"
              emptyText="Nobody has an account yet."
            />
          }
        />
      </section>
      <InviteForm
        key={invited}
        lastResult={actionData?.result}
        constraint={loaderData.constraint}
      />
    </div>
  );
}

function InviteForm({
  lastResult,
  constraint,
}: {
  lastResult: SubmissionResult<string[]> | undefined;
  /** The fields' constraints (required, lengths), from the loader. */
  constraint: Route.ComponentProps["loaderData"]["constraint"];
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/people-schemas").then((module) => module.inviteSchema),
  );
  const [form, fields] = useForm({
    id: "invite",
    lastResult,
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="invite-heading" className="panel h-fit">
      <h2 id="invite-heading" className="mb-3 text-lg font-semibold">
        Invite someone
      </h2>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField field={fields.name} label="Name" autoComplete="off" />
        <TextField
          field={fields.email}
          label="E-mail"
          type="email"
          autoComplete="off"
        />
        <RoleCheckboxes field={fields.roles} />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Send invitation
        </button>
      </Form>
    </section>
  );
}
