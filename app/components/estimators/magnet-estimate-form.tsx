import { getFormProps, type FormMetadata } from "@conform-to/react";
import type { MagnetShape } from "~/engineering/magnet-estimate";
import type { MagnetEstimateRequest } from "~/lib/estimate-requests";
import { QuantityField } from "~/components/quantity-field";
import {
  MagnetDimensionInputs,
  MagnetShapePicker,
} from "~/components/magnet-shape-fields";
import { MagnetGradeSelect, type GradeChoice } from "./magnet-grade-select";
import type { MagnetEstimatorFields } from "./use-magnet-estimate";

/** "N42 is estimated from −70 to 150 °C; its Curie point is about 310 °C." */
function temperatureHint(grade: GradeChoice | undefined): string | undefined {
  if (!grade) return undefined;
  return `${grade.name} is estimated from ${grade.usableMinC} to ${grade.usableMaxC} °C; its Curie point is about ${grade.curieTemperatureC} °C`.replace(
    "-",
    "−",
  );
}

/** The magnet to estimate: grade, shape and size, count, temperature and Br, and the air gap. */
export function MagnetEstimateForm({
  form,
  fields,
  formRef,
  onFormChange,
  grades,
  apiErrors,
}: {
  form: FormMetadata<MagnetEstimateRequest>;
  fields: MagnetEstimatorFields;
  formRef: React.RefObject<HTMLFormElement | null>;
  onFormChange: () => void;
  grades: React.ComponentProps<typeof MagnetGradeSelect>["grades"];
  /** The API's field messages, shown while they belong to the input on screen. */
  apiErrors: Record<string, string[]>;
}) {
  const shape = fields.shape.getFieldset();
  const kind = (shape.kind.value ?? "block") as MagnetShape["kind"];
  return (
    <form
      method="post"
      {...getFormProps(form)}
      ref={formRef}
      onChange={onFormChange}
      aria-label="Magnet"
      className="panel space-y-6 print:hidden"
    >
      <MagnetGradeSelect
        field={fields.grade}
        grades={grades}
        extraErrors={apiErrors.grade}
      />

      <MagnetShapePicker field={shape.kind} />

      <fieldset className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-2 xl:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
          Dimensions of one piece
        </legend>
        <MagnetDimensionInputs
          fieldset={shape}
          kind={kind}
          apiErrors={apiErrors}
        />
        <QuantityField
          field={fields.count}
          label="Pieces"
          extraErrors={apiErrors.count}
        />
      </fieldset>

      <fieldset className="grid grid-cols-2 gap-4">
        <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
          Temperature and Br
        </legend>
        <QuantityField
          field={fields.temperatureC}
          label="Magnet temperature"
          unit="°C"
          allowNegative
          hint={temperatureHint(
            grades.find((grade) => grade.name === fields.grade.value),
          )}
          extraErrors={apiErrors.temperatureC}
        />
        <QuantityField
          field={fields.br20T}
          label="Br at 20 °C"
          unit="T"
          hint="From the maker's data sheet; blank uses the middle of the grade's range"
          extraErrors={apiErrors.br20T}
        />
      </fieldset>

      <fieldset className="grid gap-4">
        <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
          Air gap and working point (optional)
        </legend>
        <QuantityField
          field={fields.magnetLengthMm}
          label="Magnet length along magnetisation"
          unit="mm"
          hint="For a surface magnet, its thickness"
          extraErrors={apiErrors.magnetLengthMm}
        />
        <QuantityField
          field={fields.airGapMm}
          label="Air gap"
          unit="mm"
          hint="The mechanical gap plus any non-magnetic sleeve"
          extraErrors={apiErrors.airGapMm}
        />
        <QuantityField
          field={fields.demagnetisingFieldKAm}
          label="Demagnetising field from the winding"
          unit="kA/m"
          hint="At the highest current, against the magnetisation; blank for none"
          extraErrors={apiErrors.demagnetisingFieldKAm}
        />
      </fieldset>
      <p className="text-xs text-graphite-500">
        Results follow as you type. Press Enter to update them at once.
      </p>
    </form>
  );
}
