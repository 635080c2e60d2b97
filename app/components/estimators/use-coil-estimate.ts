import { useForm } from "@conform-to/react";
import { useEffect, useRef, useState } from "react";
import { useFetcher } from "react-router";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import type { CoilEstimate } from "~/engineering/coil-estimate";
import type { ApiAnswer } from "~/lib/api-request";
import { coilEstimatorDefaults } from "~/lib/coil-estimator-fields";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";
import { coilFormFieldErrors } from "./coil-estimate-field-errors";

/** What the coil estimator's clientAction answers: the API's answer, with the input it answered. */
export type CoilEstimateAnswer = ApiAnswer<CoilEstimate> & {
  input: CoilEstimateRequest;
};

/** The form's schema (with zod), loaded with import(): not first-load JavaScript. */
const loadCoilForm = () => import("~/lib/coil-estimator-form");

/**
 * The coil estimator's form and its estimates: each change redraws the coil at once and
 * asks for a new estimate a moment later (through the page's clientAction at `action`);
 * the last good estimate stays while a field is being fixed. The form's schema is
 * loaded after hydration (useBrowserValidation); the constraints come from the loader.
 */
export function useCoilEstimate(action: string, constraint: FieldConstraints) {
  const fetcher = useFetcher<CoilEstimateAnswer>();
  const validate = useBrowserValidation(() =>
    loadCoilForm().then((module) => module.coilEstimatorFormSchema),
  );
  const [form, fields] = useForm({
    id: "coil-estimator",
    defaultValue: coilEstimatorDefaults,
    constraint,
    shouldValidate: "onInput",
    onValidate: validate,
    onSubmit(event) {
      event.preventDefault();
      void calculate(event.currentTarget);
    },
  });
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const [drawing, setDrawing] = useState({
    activeLengthMm: Number(coilEstimatorDefaults.activeLengthMm),
    endTurnLengthMm: Number(coilEstimatorDefaults.endTurnLengthMm),
  });
  async function calculate(formElement: HTMLFormElement) {
    const formData = new FormData(formElement);
    // Loaded once the page has run (the same import()s useBrowserValidation makes).
    const [{ parseForm }, { coilEstimatorFormSchema, coilRequestFromForm }] =
      await Promise.all([import("~/lib/parse-form"), loadCoilForm()]);
    const submission = parseForm(formData, { schema: coilEstimatorFormSchema });
    if (submission.status !== "success") return;
    void fetcher.submit(
      JSON.parse(JSON.stringify(coilRequestFromForm(submission.value))),
      { method: "post", action, encType: "application/json" },
    );
  }

  function onFormChange(event: React.FormEvent<HTMLFormElement>) {
    const formElement = event.currentTarget;
    const data = new FormData(formElement);
    setDrawing({
      activeLengthMm: Number(data.get("activeLengthMm") || Number.NaN),
      endTurnLengthMm: Number(data.get("endTurnLengthMm") || Number.NaN),
    });
    clearTimeout(timer.current);
    timer.current = setTimeout(() => void calculate(formElement), 300);
  }

  // The first estimate, for the starting values.
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (formRef.current) void calculate(formRef.current);
    return () => clearTimeout(timer.current);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  /** The end-turn helper's length, put in the field, drawn and estimated. */
  function applyEndTurnLength(lengthMm: number) {
    form.update({
      name: fields.endTurnLengthMm.name,
      value: String(lengthMm),
    });
    setDrawing((current) => ({ ...current, endTurnLengthMm: lengthMm }));
    clearTimeout(timer.current);
    timer.current = setTimeout(
      () => formRef.current && void calculate(formRef.current),
      50,
    );
  }

  // The last good estimate stays on screen while the builder fixes a field.
  const answer = fetcher.data;
  const [lastGood, setLastGood] = useState<{
    estimate: CoilEstimate;
    input: CoilEstimateRequest;
  } | null>(null);
  const [seenAnswer, setSeenAnswer] = useState(answer);
  if (answer !== seenAnswer) {
    setSeenAnswer(answer);
    if (answer?.ok) setLastGood({ estimate: answer.data, input: answer.input });
  }

  return {
    form,
    fields,
    formRef,
    onFormChange,
    drawing,
    applyEndTurnLength,
    answer,
    lastGood,
    apiFieldErrors: coilFormFieldErrors(answer),
    // Dimmed (and busy) while the estimate is worked out; once it is back the figures
    // are final, though the root and layout loaders are still read again after it
    // ("loading").
    pending: fetcher.state === "submitting" || Boolean(answer && !answer.ok),
  };
}

export type CoilEstimatorFields = ReturnType<typeof useCoilEstimate>["fields"];
