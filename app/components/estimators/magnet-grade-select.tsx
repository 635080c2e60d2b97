import { getSelectProps, type FieldMetadata } from "@conform-to/react";
import type { MagnetMaterial } from "~/engineering/reference-data";
import { formatQuantity } from "~/lib/format";
import { groupMagnetGrades } from "~/reference/magnet-materials";
import {
  formatPercentPerKelvin,
  formatRange,
} from "~/reference/quantity-display";

/** What the grade list shows of each grade. */
export interface GradeChoice {
  name: string;
  material: MagnetMaterial;
  brMinT: number;
  brMaxT: number;
  hcjMinKAm: number;
  maxWorkingTemperatureC: number;
  brTemperatureCoefficientPerK: number;
  densityGPerCm3: number;
  /** The temperatures the estimate answers for, °C (magnetTemperatureRange). */
  usableMinC: number;
  usableMaxC: number;
  curieTemperatureC: number;
}

/** The grade list, grouped by material, with the chosen grade's main values beneath. */
export function MagnetGradeSelect({
  field,
  grades,
  extraErrors,
}: {
  field: FieldMetadata<string | undefined>;
  grades: GradeChoice[];
  extraErrors?: string[];
}) {
  const { key, ...selectProps } = getSelectProps(field);
  const errors = field.errors ?? extraErrors;
  const chosen = grades.find((grade) => grade.name === field.value);
  const describedBy = [
    errors ? field.errorId : null,
    chosen ? field.descriptionId : null,
  ]
    .filter(Boolean)
    .join(" ");
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        Grade
      </label>
      <select
        key={key}
        {...selectProps}
        aria-invalid={errors ? true : undefined}
        aria-describedby={describedBy || undefined}
        className="field-input"
      >
        {groupMagnetGrades(grades).map((group) => (
          <optgroup key={group.material} label={group.label}>
            {group.grades.map((grade) => (
              <option key={grade.name} value={grade.name}>
                {grade.name}
              </option>
            ))}
          </optgroup>
        ))}
      </select>
      {chosen ? (
        <p id={field.descriptionId} className="mt-1 text-xs text-graphite-500">
          Br {formatRange(chosen.brMinT, chosen.brMaxT, "T", 2)} · HcJ ≥{" "}
          {formatQuantity(chosen.hcjMinKAm, "kA/m")} · up to{" "}
          {formatQuantity(chosen.maxWorkingTemperatureC, "°C")} · αBr{" "}
          {formatPercentPerKelvin(chosen.brTemperatureCoefficientPerK)} ·{" "}
          {formatQuantity(chosen.densityGPerCm3, "g/cm³", 2)}
        </p>
      ) : null}
      {errors ? (
        <p id={field.errorId} className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
