import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { createColumnHelper } from "~/lib/table-columns";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import type { Route } from "./+types/designs";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { TextAreaField } from "~/components/text-area-field";
import { FormMessages, TextField } from "~/components/text-field";
import { newDesignFormSchema } from "~/designs/design-schemas";
import {
  insulationClasses,
  insulationClassLabel,
} from "~/designs/insulation-classes";
import { findRevision } from "~/designs/design-revisions.server";
import { createDesign, listDesigns } from "~/designs/designs.server";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatQuantity } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import { readPageOrLast } from "~/lib/search-params";
import {
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { isDomainError } from "~/lib/domain-error";
import { countText } from "~/lib/unit-text";
import { refusalReply } from "~/lib/refusal-reply";

const designsPerPage = 25;

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  // A page past the end (designs were removed, or a typed address) shows the last one.
  const { query, ignored } = readListFilters(
    searchPageSchema,
    new URL(request.url).searchParams,
  );
  const listed = await readPageOrLast(query.page, designsPerPage, (page) =>
    listDesigns({ page, perPage: designsPerPage, search: query.search }),
  );
  return {
    search: query.search,
    ignored,
    designs: listed.designs,
    total: listed.total,
    page: listed.page,
    pageCount: listed.pageCount,
    canCreate: userCan(user, "editDesigns"),
    // The new-design form's constraints for its first render; its check loads after hydration.
    constraint: getZodConstraint(newDesignFormSchema),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "editDesigns");
  const submission = parseForm(await request.formData(), {
    schema: newDesignFormSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  let created: { id: number; revision: number };
  try {
    created = await createDesign(submission.value, user.id);
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = refusalReply(submission, error.field, error.message);
    return data({ result }, { status: error.status });
  }
  const page = `/designs/${created.id}/revisions/${created.revision}`;
  const made = await findRevision(created.id, created.revision);
  return made
    ? redirectWithFlash(page, { code: "design-created", id: made.revision.id })
    : redirect(page);
}

export const meta: Route.MetaFunction = () => [
  { title: "Designs · Turnledger" },
];

type Design = Route.ComponentProps["loaderData"]["designs"][number];
const column = createColumnHelper<Design>();
const latestOf = (design: Design) => design.revisions[0];

const columns = [
  column.accessor("name", {
    header: "Design",
    cell: (info) => {
      const design = info.row.original;
      const latest = latestOf(design);
      return (
        <div className="min-w-44">
          {latest ? (
            <Link
              to={`/designs/${design.id}/revisions/${latest.revision}`}
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              {design.name}
            </Link>
          ) : (
            <span className="font-medium">{design.name}</span>
          )}
          {design.description ? (
            <p className="line-clamp-2 text-xs text-graphite-500">
              {design.description}
            </p>
          ) : null}
        </div>
      );
    },
  }),
  column.accessor("motorType", {
    header: "Motor type",
    cell: (info) => info.getValue() || "—",
  }),
  column.display({
    id: "revisions",
    header: "Revisions",
    cell: (info) => {
      const design = info.row.original;
      return (
        <ul className="flex flex-wrap gap-1.5">
          {design.revisions.map((revision) => (
            <li key={revision.revision}>
              <Link
                to={`/designs/${design.id}/revisions/${revision.revision}`}
                aria-label={`${design.name} revision ${revision.revision}, ${revision.status}`}
                className={`inline-block rounded-md border px-2 py-0.5 text-xs ${
                  revision.status === "released"
                    ? "border-graphite-500 bg-graphite-100 text-graphite-800"
                    : "border-dashed border-copper-500 bg-copper-50 text-copper-700"
                }`}
              >
                {revision.revision} · {revision.status}
              </Link>
            </li>
          ))}
        </ul>
      );
    },
  }),
  column.display({
    id: "torque",
    header: "Rated torque (latest)",
    meta: { numeric: true },
    cell: (info) => {
      const latest = latestOf(info.row.original);
      if (!latest || latest.ratedTorqueNm === null) return "—";
      return (
        <span className="whitespace-nowrap">
          {formatQuantity(latest.ratedTorqueNm, "N·m", 3)}{" "}
          <span className="text-xs text-graphite-500">
            {latest.torqueBasis}
          </span>
        </span>
      );
    },
  }),
];

export default function Designs({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { designs, total, page, pageCount, canCreate, search, ignored } =
    loaderData;
  return (
    <div
      className={canCreate ? "grid gap-8 lg:grid-cols-[1fr_24rem]" : undefined}
    >
      <section aria-labelledby="designs-heading" className="min-w-0">
        <div className="mb-4">
          <h1 id="designs-heading" className="text-2xl font-semibold">
            Designs
          </h1>
          <p className="mt-1 max-w-2xl text-graphite-500">
            Motors and their bills of materials, revision by revision. A
            released revision is locked and can be built; changes go into the
            next revision.
          </p>
        </div>
        <div className="mb-4 space-y-3">
          <ListSearchForm
            path="/designs"
            label="Search the designs"
            search={{ value: search, placeholder: "Name or motor type" }}
            filtered={Boolean(search)}
          />
          <IgnoredFilters names={ignored} />
        </div>
        {total > 0 ? (
          <p className="mb-2 text-sm text-graphite-500">
            {`${countText(total, "design")}, by name`}
          </p>
        ) : null}
        <DataTable
          caption="Designs with their revisions"
          columns={columns}
          rows={designs}
          page={page}
          pageCount={pageCount}
          pageHref={(target) => listHref("/designs", { search, page: target })}
          emptyText={
            <ListEmptyText
              filtered={Boolean(search)}
              clearHref="/designs"
              emptyText={
                <EmptyState
                  message="No designs yet."
                  next={{
                    capability: "editDesigns",
                    to: "#new-design",
                    label: "Create a design",
                    does: "create designs",
                  }}
                />
              }
            />
          }
        />
      </section>
      {canCreate ? (
        <NewDesignForm
          constraint={loaderData.constraint}
          lastResult={actionData?.result}
        />
      ) : null}
    </div>
  );
}

function NewDesignForm({
  constraint,
  lastResult,
}: {
  constraint: FieldConstraints;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/designs/design-schemas").then(
      (module) => module.newDesignFormSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "new-design",
    lastResult,
    defaultValue: {
      torqueBasis: "estimated",
      insulationClassC: "155",
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  // The schema reads numbers from text, so Conform types them as unknown; the inputs need name, id and errors.
  const number = fields as unknown as Record<
    keyof typeof fields,
    Parameters<typeof QuantityField>[0]["field"]
  >;
  return (
    <section aria-labelledby="new-design-heading" className="panel h-fit">
      <h2 id="new-design-heading" className="mb-1 text-lg font-semibold">
        New design
      </h2>
      <p className="mb-4 text-sm text-graphite-500">
        Starts as revision 1, a draft. Coils, magnets and parts are added on its
        page.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField field={fields.name} label="Name" autoComplete="off" />
        <TextField
          field={fields.motorType}
          label="Motor type"
          autoComplete="off"
          hint="In your words: outrunner, axial flux, linear …"
        />
        <TextAreaField
          field={fields.description}
          label="Description"
          rows={2}
        />
        <div className="grid grid-cols-2 gap-4">
          <QuantityField field={number.poles} label="Poles" />
          <QuantityField field={number.slots} label="Slots" />
          <QuantityField
            field={number.ratedCurrentA}
            label="Rated current (RMS per phase)"
            unit="A"
          />
          <SelectField field={fields.insulationClassC} label="Insulation class">
            {insulationClasses.map((classC) => (
              <option key={classC} value={classC}>
                {insulationClassLabel(classC)}
              </option>
            ))}
          </SelectField>
          <QuantityField
            field={number.ratedTorqueNm}
            label="Rated torque"
            unit="N·m"
            hint="Optional"
          />
          <SelectField field={fields.torqueBasis} label="Rated torque is">
            <option value="measured">measured</option>
            <option value="estimated">estimated</option>
          </SelectField>
        </div>
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Create design
        </button>
      </Form>
    </section>
  );
}
