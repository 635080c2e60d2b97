/** The Conform form of a new order or a draft's edit, checked in the browser with the schema the server uses. */
import { useForm, type SubmissionResult } from "@conform-to/react";
import { parseForm } from "~/lib/parse-form";
import { useNavigation } from "react-router";
import type { z } from "zod";
import type { OrderFormShape } from "./order-lines-editor";

export function useOrderForm<Schema extends z.ZodType>(
  id: string,
  schema: Schema,
  defaultValue: OrderFormShape,
  lastResult: SubmissionResult<string[]> | undefined,
) {
  const navigation = useNavigation();
  const [form, fields] = useForm<OrderFormShape, z.output<Schema>>({
    id,
    lastResult: navigation.state === "idle" ? lastResult : null,
    defaultValue,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate({ formData }) {
      return parseForm(formData, { schema, disableAutoCoercion: true });
    },
  });
  return { form, fields, busy: navigation.state !== "idle" };
}
