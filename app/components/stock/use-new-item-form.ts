/**
 * The new-item form's state (Conform), checked in the browser as on the server: the
 * schema is loaded after hydration (useBrowserValidation), the constraints come from
 * the loader.
 */
import { useForm, type SubmissionResult } from "@conform-to/react";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";

export function useNewItemForm(
  lastResult: SubmissionResult<string[]> | null | undefined,
  startKind: string,
  constraint: FieldConstraints,
) {
  const validate = useBrowserValidation(() =>
    import("~/stock/new-item-form").then((module) => module.newItemFormSchema),
  );
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
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
}

export type NewItemFields = ReturnType<typeof useNewItemForm>[1];
