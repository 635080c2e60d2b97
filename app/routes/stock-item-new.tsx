import {
  getFormProps,
  getInputProps,
  useForm,
  type FieldMetadata,
} from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stock-item-new";
import { requireCapability } from "~/auth/guard.server";
import { MagnetItemFields } from "~/components/magnet-item-fields";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";
import { WireItemFields } from "~/components/wire-item-fields";
import { itemKinds } from "~/db/tables/stock-enums";
import { redirectWithFlash } from "~/lib/flash.server";
import { listMagnetGrades } from "~/reference/magnet-grades.server";
import { listWireSizes } from "~/reference/wire-sizes.server";
import { createItem } from "~/stock/catalogue.server";
import { newItemFormSchema, unitOfNewItem } from "~/stock/new-item-form";
import { isDomainError } from "~/lib/domain-error";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "keepCatalogue");
  const [awg, iec, grades] = await Promise.all([
    listWireSizes("AWG"),
    listWireSizes("IEC"),
    listMagnetGrades(),
  ]);
  const kind = new URL(request.url).searchParams.get("kind");
  return {
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
  const submission = parseWithZod(await request.formData(), {
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
    const result = error.field
      ? submission.reply({ fieldErrors: { [error.field]: [error.message] } })
      : submission.reply({ formErrors: [error.message] });
    return data({ result }, { status: error.status });
  }
  return redirectWithFlash(`/stock/items/${encodeURIComponent(sku)}`, {
    code: "item-created",
  });
}

export const meta: Route.MetaFunction = () => [
  { title: "New item · Stock · Turnledger" },
];

const kindChoices = [
  { kind: "wire", label: "Magnet wire", detail: "kept in kg, on spools" },
  { kind: "magnet", label: "Permanent magnet", detail: "kept in pieces" },
  {
    kind: "part",
    label: "Other part",
    detail: "bearings, shafts, laminations …",
  },
] as const;

type Field = FieldMetadata<unknown>;

export default function NewStockItem({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { startKind, sizes, grades } = loaderData;
  const navigation = useNavigation();
  const [form, fields] = useForm({
    id: "new-item",
    lastResult: actionData?.result,
    defaultValue: {
      kind: startKind,
      conductor: "copper",
      standard: "IEC",
      shape: { kind: "block" },
      unit: "pcs",
      reorderPoint: "0",
      reorderQuantity: "0",
    },
    constraint: getZodConstraint(newItemFormSchema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) =>
      parseWithZod(formData, { schema: newItemFormSchema }),
  });
  const kind = fields.kind.value ?? startKind;
  const unit = unitOfNewItem(
    kind,
    typeof fields.unit.value === "string" ? fields.unit.value : undefined,
  );

  return (
    <div className="max-w-4xl space-y-6">
      <p className="text-sm">
        <Link
          to="/stock"
          className="text-copper-700 underline underline-offset-2"
        >
          ← Stock
        </Link>
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

        <fieldset
          aria-describedby={
            fields.kind.errors ? fields.kind.errorId : undefined
          }
        >
          <legend className="field-label">What is it?</legend>
          <div className="mt-1 grid gap-2 sm:grid-cols-3">
            {kindChoices.map((choice) => {
              const { key, ...radioProps } = getInputProps(fields.kind, {
                type: "radio",
                value: choice.kind,
              });
              return (
                <label
                  key={choice.kind}
                  className="relative flex cursor-pointer flex-col rounded-md border border-graphite-300 bg-white px-3 py-2 has-checked:border-copper-500 has-checked:bg-copper-50 has-focus-visible:outline-2 has-focus-visible:outline-copper-500"
                >
                  <input
                    key={key}
                    {...radioProps}
                    className="absolute inset-0 z-10 cursor-pointer opacity-0"
                  />
                  <span className="font-medium">{choice.label}</span>
                  <span className="text-xs text-graphite-500">
                    {choice.detail}
                  </span>
                </label>
              );
            })}
          </div>
          {fields.kind.errors ? (
            <p id={fields.kind.errorId} className="field-error">
              {fields.kind.errors.join(" ")}
            </p>
          ) : null}
        </fieldset>

        <div className="grid gap-4 sm:grid-cols-[14rem_1fr]">
          <TextField
            field={fields.sku}
            label="SKU"
            autoComplete="off"
            hint="Letters, digits, dot, underscore, slash, hyphen; fixed once saved"
          />
          <TextField field={fields.name} label="Name" autoComplete="off" />
        </div>

        {kind === "wire" ? (
          <WireItemFields
            fields={{
              conductor: fields.conductor as Field,
              standard: fields.standard as Field,
              size: fields.size as Field,
              insulation: fields.insulation as Field,
              thermalClass: fields.thermalClass as Field,
              enamel: fields.enamel as Field,
            }}
            sizes={sizes}
          />
        ) : kind === "magnet" ? (
          <MagnetItemFields
            fields={{
              grade: fields.grade as Field,
              shape: fields.shape as unknown as FieldMetadata<
                Record<string, unknown> | undefined
              >,
              coating: fields.coating as Field,
              magnetisation: fields.magnetisation as Field,
            }}
            grades={grades}
          />
        ) : (
          <fieldset className="grid gap-4 sm:grid-cols-2">
            <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
              Part
            </legend>
            <SelectField field={fields.unit as Field} label="Kept in">
              <option value="pcs">pieces (pcs)</option>
              <option value="m">metres (m)</option>
              <option value="kg">kilograms (kg)</option>
            </SelectField>
          </fieldset>
        )}

        <fieldset className="grid gap-4 sm:grid-cols-2">
          <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
            Reordering
          </legend>
          <QuantityField
            field={fields.reorderPoint}
            label="Reorder point"
            unit={unit}
            hint="Buyers hear of it when the available stock falls below; 0 for no alert"
          />
          <QuantityField
            field={fields.reorderQuantity}
            label="Reorder quantity"
            unit={unit}
            hint="How much to order at a time"
          />
        </fieldset>

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
