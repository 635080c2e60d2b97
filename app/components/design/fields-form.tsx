import { getFormProps, useForm } from "@conform-to/react";
import { useFetcher } from "react-router";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import type { DesignPageData } from "~/designs/design-page.server";
import {
  insulationClasses,
  insulationClassLabel,
} from "~/designs/insulation-classes";
import {
  DEFAULT_POLE_COVERAGE,
  DEFAULT_POLE_COVERAGE_SOURCE,
} from "~/designs/torque-estimate";
import { formatNumberForField } from "~/lib/format";
import type { DesignActionAnswer } from "./action-answer";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { TextAreaField } from "~/components/text-area-field";
import { FormMessages } from "~/components/text-field";

type Revision = DesignPageData["revision"];

const text = (value: number | null) => formatNumberForField(value);

/**
 * The revision's motor figures, editable while it is a draft; each save goes through a
 * fetcher. The constraints come from the loader, the schema loads after hydration.
 */
export function DesignFieldsForm({
  revision,
  constraint,
}: {
  revision: Revision;
  constraint: FieldConstraints;
}) {
  const fetcher = useFetcher<DesignActionAnswer>();
  const validate = useBrowserValidation(() =>
    import("~/designs/design-schemas").then(
      (module) => module.revisionFormSchema,
    ),
  );
  const [form, fields] = useForm({
    id: `design-fields-${revision.designId}-${revision.revision}`,
    lastResult: fetcher.data?.result,
    defaultValue: {
      poles: String(revision.poles),
      slots: String(revision.slots),
      ratedCurrentA: formatNumberForField(revision.ratedCurrentA),
      ratedTorqueNm: text(revision.ratedTorqueNm),
      torqueBasis: revision.torqueBasis,
      insulationClassC: String(revision.insulationClassC),
      slotAreaMm2: text(revision.slotAreaMm2),
      slotLinerAreaMm2: text(revision.slotLinerAreaMm2),
      coilSidesPerSlot: String(revision.coilSidesPerSlot),
      phases: String(revision.phases),
      windingLayers: String(revision.windingLayers),
      phaseConnection: revision.phaseConnection,
      parallelPaths: String(revision.parallelPaths),
      ratedSpeedRpm: text(revision.ratedSpeedRpm),
      airGapRadiusMm: text(revision.airGapRadiusMm),
      airGapFluxDensityT: text(revision.airGapFluxDensityT),
      poleCoverage: text(revision.poleCoverage),
      notes: revision.notes,
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  const busy = fetcher.state !== "idle";
  // The schema reads numbers from text (z.preprocess), so Conform types these fields as unknown;
  // the inputs only need each field's name, id and errors.
  const number = fields as unknown as Record<
    keyof typeof fields,
    Parameters<typeof QuantityField>[0]["field"]
  >;

  return (
    <section aria-labelledby="motor-heading" className="panel">
      <h2 id="motor-heading" className="mb-3 text-lg font-semibold">
        Motor
      </h2>
      <fetcher.Form method="post" {...getFormProps(form)} className="space-y-4">
        <input type="hidden" name="intent" value="fields" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          <QuantityField field={number.poles} label="Poles" />
          <QuantityField field={number.slots} label="Slots" />
          <QuantityField
            field={number.ratedCurrentA}
            label="Rated current (RMS per phase)"
            unit="A"
            hint="RMS phase current of a sinusoidal drive at the rated point; each coil carries it ÷ parallel paths"
          />
          <SelectField
            field={fields.insulationClassC}
            label="Insulation class"
            hint="IEC 60085; every wire must be at least this class"
          >
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
            hint="For cost per N·m; when empty, the first-order estimate stands in (labelled so)"
          />
          <SelectField field={fields.torqueBasis} label="Rated torque is">
            <option value="measured">measured (test data)</option>
            <option value="estimated">estimated</option>
          </SelectField>
          <QuantityField
            field={number.slotAreaMm2}
            label="Slot area"
            unit="mm²"
            hint="The whole slot; gives each coil's copper and gross fill"
          />
          <QuantityField
            field={number.slotLinerAreaMm2}
            label="Slot liner and separator area"
            unit="mm²"
            hint="Taken from the slot area for the gross fill; empty for none"
          />
          <SelectField
            field={fields.coilSidesPerSlot}
            label="Coil sides per slot"
          >
            <option value="1">1 (single layer)</option>
            <option value="2">2 (double layer)</option>
          </SelectField>
          <QuantityField field={number.phases} label="Phases" />
          <SelectField field={fields.windingLayers} label="Winding layers">
            <option value="2">2 (double layer)</option>
            <option value="1">1 (single layer)</option>
          </SelectField>
          <SelectField field={fields.phaseConnection} label="Phase connection">
            <option value="star">star (wye)</option>
            <option value="delta">delta</option>
          </SelectField>
          <QuantityField
            field={number.parallelPaths}
            label="Parallel paths per phase"
            hint="a: the coils of a phase in a equal paths"
          />
          <QuantityField
            field={number.ratedSpeedRpm}
            label="Rated speed"
            unit="rpm"
            hint="For the electrical frequency"
          />
          <QuantityField
            field={number.airGapRadiusMm}
            label="Air-gap radius"
            unit="mm"
            hint="For the first-order torque estimate"
          />
          <QuantityField
            field={number.airGapFluxDensityT}
            label="Air-gap flux density"
            unit="T"
            hint="Typed, or from the magnet estimator"
          />
          <QuantityField
            field={number.poleCoverage}
            label="Magnet arc ÷ pole pitch, α_p"
            hint={`For the fundamental of the air-gap field. Empty for ${DEFAULT_POLE_COVERAGE}: ${DEFAULT_POLE_COVERAGE_SOURCE}`}
          />
        </div>
        <TextAreaField field={fields.notes} label="Notes" rows={2} />
        <div className="flex flex-wrap items-center gap-3">
          <button type="submit" className="button-quiet" disabled={busy}>
            {busy ? "Saving…" : "Save motor figures"}
          </button>
        </div>
      </fetcher.Form>
    </section>
  );
}
