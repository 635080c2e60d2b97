import { useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { useRef, useState } from "react";
import { useFetcher } from "react-router";
import {
  magnetEstimateRequestSchema,
  type MagnetEstimateRequest,
} from "~/lib/estimate-requests";
import type { EstimateAnswer } from "./magnet-estimate-api";
import {
  magnetFormValues,
  magnetRequestOf,
  startingMagnetInput,
} from "./magnet-estimator-form";

/**
 * The magnet estimator's form and its estimates: each change asks for a new estimate a
 * moment later (through the page's clientAction at `action`); until then, and while
 * fields are refused, the last estimate stays (the first came with the page).
 */
export function useMagnetEstimate(
  action: string,
  /** The estimate that came with the page, for its starting input. */
  startingAnswer: Extract<EstimateAnswer, { ok: true }> | null,
) {
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
    constraint: getZodConstraint(magnetEstimateRequestSchema),
    shouldValidate: "onInput",
    onValidate({ formData }) {
      return parseForm(formData, { schema: magnetEstimateRequestSchema });
    },
    onSubmit(event) {
      event.preventDefault();
      estimate();
    },
  });

  function estimate() {
    clearTimeout(timer.current);
    if (!formRef.current) return;
    const submission = parseForm(new FormData(formRef.current), {
      schema: magnetEstimateRequestSchema,
    });
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
    timer.current = setTimeout(estimate, 300);
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
