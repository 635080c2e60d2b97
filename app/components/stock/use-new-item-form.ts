/** The new-item form's state (Conform), checked in the browser as on the server. */
import { useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { newItemFormSchema } from "~/stock/new-item-form";

export function useNewItemForm(
  lastResult: SubmissionResult<string[]> | null | undefined,
  startKind: string,
) {
  return useForm({
    id: "new-item",
    lastResult,
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
      parseForm(formData, { schema: newItemFormSchema }),
  });
}

export type NewItemFields = ReturnType<typeof useNewItemForm>[1];
