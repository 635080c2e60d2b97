import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { lazy, Suspense, useEffect } from "react";
import { data, Link } from "react-router";
import type { Route } from "./+types/reference";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { ConductorMaterialTable } from "~/components/conductor-material-table";
import { useFlash } from "~/components/flash-message";
import { InsulationKindTable } from "~/components/insulation-kind-table";
import { MagnetGradeTable } from "~/components/magnet-grade-table";
import { ThermalClassTable } from "~/components/thermal-class-table";
import { WireSizeTable } from "~/components/wire-size-table";
import { redirectWithFlash } from "~/lib/flash.server";
import { userCan } from "~/lib/capabilities";
import { addMagnetGrade } from "~/reference/magnet-grade-admin.server";
import {
  magnetGradeFormSchema,
  magnetGradeKey,
} from "~/reference/magnet-grade-form";
import {
  listConductorMaterials,
  listInsulationKinds,
  listMagnetGradeRows,
  listThermalClasses,
  listWireSizeRows,
} from "~/reference/reference-tables.server";

/**
 * The admins' add-a-grade form (Conform, its fields) loads with import(), not with the
 * page, and is fetched as soon as an admin's page has run: the server renders it
 * whole, React keeps that form in place until its code has come, and until then it is
 * sent and checked by the action as without JavaScript
 * (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
const loadGradeForm = () => import("~/components/add-magnet-grade-form");
const AddMagnetGradeForm = lazy(() =>
  loadGradeForm().then((module) => ({ default: module.AddMagnetGradeForm })),
);

/** The tables of the page, in the order of the switch; `?table=` picks one. */
const tables = [
  { id: "wire-sizes", title: "Wire sizes" },
  { id: "insulation", title: "Insulation" },
  { id: "thermal-classes", title: "Thermal classes" },
  { id: "conductors", title: "Conductors" },
  { id: "magnet-grades", title: "Magnet grades" },
] as const;

type TableId = (typeof tables)[number]["id"];

function tableFromSearch(value: string | null): TableId {
  if (value === null || value === "") return "wire-sizes";
  const table = tables.find((candidate) => candidate.id === value);
  if (!table)
    throw data(
      { message: `There is no reference table called “${value}”.` },
      { status: 404 },
    );
  return table.id;
}

async function rowsOf(table: TableId) {
  switch (table) {
    case "wire-sizes":
      return { table, rows: await listWireSizeRows() };
    case "insulation":
      return { table, rows: await listInsulationKinds() };
    case "thermal-classes":
      return { table, rows: await listThermalClasses() };
    case "conductors":
      return { table, rows: await listConductorMaterials() };
    case "magnet-grades":
      return { table, rows: await listMagnetGradeRows() };
  }
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const search = new URL(request.url).searchParams;
  const table = tableFromSearch(search.get("table"));
  return {
    section: await rowsOf(table),
    canAddGrade: userCan(user, "addMagnetGrades"),
    // The add-a-grade form's constraints for its first render; its check loads after hydration.
    gradeConstraint: getZodConstraint(magnetGradeFormSchema),
  };
}

/** Adds a magnet grade (admins only); field messages on bad input, 409 when the name is taken. */
export async function action({ request }: Route.ActionArgs) {
  const admin = await requireCapability(request, "addMagnetGrades");
  const submission = parseForm(await request.formData(), {
    schema: magnetGradeFormSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  const outcome = await addMagnetGrade(submission.value, admin.id);
  if (!outcome.added) {
    return data(
      {
        result: submission.reply({
          fieldErrors: { [outcome.field]: [outcome.message] },
        }),
      },
      { status: 409 },
    );
  }
  return redirectWithFlash("/reference?table=magnet-grades", {
    code: "grade-added",
    id: magnetGradeKey(outcome.name),
  });
}

export const meta: Route.MetaFunction = ({ loaderData }) => {
  const title = tables.find(
    (table) => table.id === loaderData?.section.table,
  )?.title;
  return [{ title: `${title ? `${title} · ` : ""}Reference · Turnledger` }];
};

function TableSwitch({ current }: { current: TableId }) {
  return (
    <nav aria-label="Reference tables" className="print:hidden">
      <ul className="flex flex-wrap gap-1 border-b border-rule">
        {tables.map((table) => {
          const active = table.id === current;
          return (
            <li key={table.id}>
              <Link
                to={`?table=${table.id}`}
                aria-current={active ? "page" : undefined}
                className={`-mb-px block rounded-t-md border px-4 py-2 text-sm font-medium ${
                  active
                    ? "border-rule border-b-sheet bg-sheet text-copper-700"
                    : "border-transparent text-graphite-700 hover:text-copper-700"
                }`}
              >
                {table.title}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}

function Section({
  section,
}: {
  section: Route.ComponentProps["loaderData"]["section"];
}) {
  switch (section.table) {
    case "wire-sizes":
      return <WireSizeTable rows={section.rows} />;
    case "insulation":
      return <InsulationKindTable rows={section.rows} />;
    case "thermal-classes":
      return <ThermalClassTable rows={section.rows} />;
    case "conductors":
      return <ConductorMaterialTable rows={section.rows} />;
    case "magnet-grades":
      return <MagnetGradeTable rows={section.rows} />;
  }
}

export default function Reference({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { section, canAddGrade } = loaderData;
  // A new key after each added grade (its message) empties the form.
  const added = useFlash()?.key ?? "new";
  const title = tables.find((table) => table.id === section.table)!.title;
  const showGradeForm = section.table === "magnet-grades" && canAddGrade;
  useEffect(() => {
    if (canAddGrade) void loadGradeForm();
  }, [canAddGrade]);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Reference tables</h1>
        <p className="mt-1 max-w-3xl text-graphite-500">
          The published values Turnledger calculates with. Every row names its
          source; &ldquo;from memory&rdquo; marks a value not yet checked
          against the printed standard, &ldquo;common practice&rdquo; a fact of
          the trade with no published source.
        </p>
      </div>
      <TableSwitch current={section.table} />
      <section aria-labelledby="table-heading" className="space-y-4">
        <div className="flex flex-wrap items-baseline justify-between gap-4">
          <h2 id="table-heading" className="text-xl font-semibold">
            {title}
          </h2>
          {showGradeForm ? (
            <a href="#add-grade-heading" className="button-quiet print:hidden">
              Add a grade from a data sheet
            </a>
          ) : null}
        </div>
        <Section key={section.table} section={section} />
      </section>
      {showGradeForm ? (
        <Suspense
          fallback={
            <p role="status" className="text-sm text-graphite-500">
              Opening the form to add a grade…
            </p>
          }
        >
          <AddMagnetGradeForm
            key={added}
            constraint={loaderData.gradeConstraint}
            lastResult={actionData?.result}
          />
        </Suspense>
      ) : null}
    </div>
  );
}
