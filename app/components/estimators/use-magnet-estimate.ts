import { useForm } from "@conform-to/react";
import { useRef, useState } from "react";
import { useFetcher } from "react-router";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import type { MagnetEstimateRequest } from "~/lib/estimate-requests";
import type { EstimateAnswer } from "./magnet-estimate-api";
import {
  magnetFormValues,
  magnetRequestOf,
  startingMagnetInput,
} from "./magnet-estimator-form";

/** The request's schema and parseForm, loaded with import() (not first-load JavaScript). */
const loadMagnetSchema = () =>
  import("~/lib/estimate-requests").then(
    (module) => module.magnetEstimateRequestSchema,
  );

/**
 * The magnet estimator's form and its estimates: each change asks for a new estimate a
 * moment later (through the page's clientAction at `action`); until then, and while
 * fields are refused, the last estimate stays (the first came with the page). The
 * request's schema is loaded after hydration (useBrowserValidation); the constraints
 * come from the loader.
 */
export function useMagnetEstimate(
  action: string,
  /** The estimate that came with the page, for its starting input. */
  startingAnswer: Extract<EstimateAnswer, { ok: true }> | null,
  constraint: FieldConstraints,
) {
  const validate = useBrowserValidation(loadMagnetSchema);
  const fetcher = useFetcher<EstimateAnswer>();
  const formRef = useRef<HTMLFormElement>(null);
  const timer = useRef<ReturnType<typeof setTimeout>>(undefined);
  /** Fields the browser's check still refuses; the estimate shown is for the last complete input. */
  const [waitingFor, setWaitingFor] = useState<string[]>([]);
  /** The API's field messages stand until the person types again. */
  const [typedSinceAnswer, setTypedSinceAnswer] = useState(false);

  const [form, fields] = useForm<MagnetEstimateRequest>({
    id: "magnet-estimate",
    defaultValue: magnetFormValues(
      startingAnswer?.input ?? startingMagnetInput,
    ),
    constraint,
    shouldValidate: "onInput",
    onValidate: validate,
    onSubmit(event) {
      event.preventDefault();
      void estimate();
    },
  });

  async function estimate() {
    clearTimeout(timer.current);
    if (!formRef.current) return;
    const formData = new FormData(formRef.current);
    // Loaded once the page has run (the same import()s useBrowserValidation makes).
    const [{ parseForm }, schema] = await Promise.all([
      import("~/lib/parse-form"),
      loadMagnetSchema(),
    ]);
    const submission = parseForm(formData, { schema });
    if (submission.status !== "success") {
      setWaitingFor(
        Object.keys(submission.error ?? {}).filter(
          (name) => submission.error?.[name]?.length,
        ),
      );
      return;
    }
    setWaitingFor([]);
    setTypedSinceAnswer(false);
    void fetcher.submit(magnetRequestOf(submission.value), {
      method: "post",
      action,
      encType: "application/json",
    });
  }

  function onFormChange() {
    setTypedSinceAnswer(true);
    clearTimeout(timer.current);
    timer.current = setTimeout(() => void estimate(), 300);
  }

  const answer = fetcher.data ?? startingAnswer;
  // The API's messages belong to the input they answered: gone once the person types or a newer answer is on its way.
  const showApiRefusal = Boolean(
    answer && !answer.ok && !typedSinceAnswer && fetcher.state === "idle",
  );
  const apiErrors = showApiRefusal && answer && !answer.ok ? answer.fields : {};

  return {
    form,
    fields,
    formRef,
    onFormChange,
    answer,
    showApiRefusal,
    apiErrors,
    waitingFor,
    updating: fetcher.state !== "idle",
  };
}

export type MagnetEstimatorFields = ReturnType<
  typeof useMagnetEstimate
>["fields"];
