import { getFormProps } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stock-item-new";
import { requireCapability } from "~/auth/guard.server";
import { ItemKindChoice } from "~/components/stock/item-kind-choice";
import { NewItemKindFields } from "~/components/stock/new-item-kind-fields";
import { ReorderingFields } from "~/components/stock/reordering-fields";
import { useNewItemForm } from "~/components/stock/use-new-item-form";
import { FormMessages, TextField } from "~/components/text-field";
import { itemKinds } from "~/db/tables/stock-enums";
import { redirectWithFlash } from "~/lib/flash.server";
import { listMagnetGrades } from "~/reference/magnet-grades.server";
import { listWireSizes } from "~/reference/wire-sizes.server";
import { createItem } from "~/stock/catalogue.server";
import { newItemFormSchema } from "~/stock/new-item-form";
import { unitOfNewItem } from "~/stock/new-item-unit";
import { isDomainError } from "~/lib/domain-error";
import { refusalReply } from "~/lib/refusal-reply";
import { BackLink } from "~/components/back-link";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "keepCatalogue");
  const [awg, iec, grades] = await Promise.all([
    listWireSizes("AWG"),
    listWireSizes("IEC"),
    listMagnetGrades(),
  ]);
  const kind = new URL(request.url).searchParams.get("kind");
  return {
    constraint: getZodConstraint(newItemFormSchema),
    startKind: (itemKinds as readonly string[]).includes(kind ?? "")
      ? kind!
      : "wire",
    sizes: {
      awg: awg.map((size) => ({
        label: size.size,
        bareDiameterMm: size.bareDiameterMm,
      })),
      iec: iec.map((size) => ({ label: size.size, series: size.series })),
    },
    grades: grades.map((grade) => ({
      name: grade.name,
      material: grade.material,
      densityGPerCm3: grade.densityGPerCm3,
    })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepCatalogue");
  const submission = parseForm(await request.formData(), {
    schema: newItemFormSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  let sku: string;
  try {
    sku = await createItem(submission.value, user.id);
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = refusalReply(submission, error.field, error.message);
    return data({ result }, { status: error.status });
  }
  return redirectWithFlash(`/stock/items/${encodeURIComponent(sku)}`, {
    code: "item-created",
  });
}

export const meta: Route.MetaFunction = () => [
  { title: "New item · Stock · Turnledger" },
];

export default function NewStockItem({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { startKind, sizes, grades, constraint } = loaderData;
  const navigation = useNavigation();
  const [form, fields] = useNewItemForm(
    actionData?.result,
    startKind,
    constraint,
  );
  const kind = fields.kind.value ?? startKind;
  const unit = unitOfNewItem(
    kind,
    typeof fields.unit.value === "string" ? fields.unit.value : undefined,
  );

  return (
    <div className="max-w-4xl space-y-6">
      <p className="text-sm">
        <BackLink to="/stock">Stock</BackLink>
      </p>
      <div>
        <h1 className="text-2xl font-semibold">New catalogue item</h1>
        <p className="mt-1 text-graphite-500">
          Stock starts at nothing: receipts are recorded in the store once the
          item exists.
        </p>
      </div>

      <Form method="post" {...getFormProps(form)} className="panel space-y-6">
        <FormMessages id={form.errorId} errors={form.errors} />
        <ItemKindChoice field={fields.kind} />
        <div className="grid gap-4 sm:grid-cols-[14rem_1fr]">
          <TextField
            field={fields.sku}
            label="SKU"
            autoComplete="off"
            hint="Letters, digits, dot, underscore, slash, hyphen; fixed once saved"
          />
          <TextField field={fields.name} label="Name" autoComplete="off" />
        </div>
        <NewItemKindFields
          kind={kind}
          fields={fields}
          sizes={sizes}
          grades={grades}
        />
        <ReorderingFields fields={fields} unit={unit} />
        <div className="flex flex-wrap items-center gap-3 border-t border-rule pt-5">
          <button
            type="submit"
            className="button-primary"
            disabled={navigation.state !== "idle"}
          >
            Add to catalogue
          </button>
          <Link to="/stock" className="button-quiet">
            Cancel
          </Link>
        </div>
      </Form>
    </div>
  );
}
