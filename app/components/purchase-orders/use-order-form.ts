/**
 * The Conform form of a new order or a draft's edit, checked in the browser with the
 * schema the server uses once it has loaded (useBrowserValidation), by the action before.
 */
import { useForm, type SubmissionResult } from "@conform-to/react";
import { useNavigation } from "react-router";
import type { z } from "zod";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import type { OrderFormShape } from "./order-lines-editor";

export function useOrderForm<Schema extends z.ZodType>(
  id: string,
  loadSchema: () => Promise<Schema>,
  defaultValue: OrderFormShape,
  lastResult: SubmissionResult<string[]> | undefined,
) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(loadSchema, {
    disableAutoCoercion: true,
  });
  const [form, fields] = useForm<OrderFormShape, z.output<Schema>>({
    id,
    lastResult: navigation.state === "idle" ? lastResult : null,
    defaultValue,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return { form, fields, busy: navigation.state !== "idle" };
}
