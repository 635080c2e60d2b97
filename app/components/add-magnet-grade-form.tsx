import { getFormProps, type SubmissionResult } from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import type { FieldConstraints } from "~/components/forms/use-browser-validation";
import { FormMessages } from "~/components/text-field";
import {
  GradeNameFields,
  GradeSourceField,
  MagneticPropertiesFields,
  TemperatureAndMaterialFields,
  useMagnetGradeForm,
} from "./add-magnet-grade-fields";

/** The admins' form on the magnet grades table: one grade from a maker's data sheet. */
export function AddMagnetGradeForm({
  constraint,
  lastResult,
}: {
  /** The form's constraints, from the loader (getZodConstraint). */
  constraint: FieldConstraints;
  lastResult?: SubmissionResult<string[]> | null;
}) {
  const navigation = useNavigation();
  const [form, fields] = useMagnetGradeForm(lastResult, constraint);
  const submitting =
    navigation.state !== "idle" && navigation.formMethod === "POST";
  return (
    <section
      aria-labelledby="add-grade-heading"
      className="panel space-y-4 print:hidden"
    >
      <div>
        <h3 id="add-grade-heading" className="text-lg font-semibold">
          Add a magnet grade
        </h3>
        <p className="mt-1 max-w-3xl text-sm text-graphite-700">
          The built-in grades come from makers&rsquo; published tables and are
          restored at every start. Add a grade when a maker&rsquo;s data sheet
          gives one that is not listed: it is kept with your name and its
          source, and the magnet estimator offers it at once.
        </p>
      </div>
      <Form method="post" {...getFormProps(form)} className="space-y-5">
        <FormMessages id={form.errorId} errors={form.errors} />
        <GradeNameFields fields={fields} />
        <MagneticPropertiesFields fields={fields} />
        <TemperatureAndMaterialFields fields={fields} />
        <GradeSourceField fields={fields} />
        <button type="submit" className="button-primary" disabled={submitting}>
          {submitting ? "Adding…" : "Add grade"}
        </button>
      </Form>
    </section>
  );
}
