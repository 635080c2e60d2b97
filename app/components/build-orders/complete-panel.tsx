/** "Finish the build": the builder closes the order once stock has been issued to it. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { FormMessages } from "~/components/text-field";

export function CompletePanel({
  order,
  primary,
  lastResult,
}: {
  order: BuildOrderDetails;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const [form] = useForm({
    id: "complete",
    lastResult: navigation.state === "idle" ? lastResult : null,
  });
  const stillHeld = order.lines.some((line) => line.reserved > 0);
  return (
    <section aria-labelledby="complete-heading" className="panel space-y-3">
      <h2 id="complete-heading" className="text-lg font-semibold">
        Finish the build
      </h2>
      <p className="text-sm text-graphite-700">
        Closes {order.reference} and records what was used against the plan.
        {stillHeld
          ? " What is still held for it goes back to the free stock."
          : null}
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-3">
        <input type="hidden" name="intent" value="complete" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <button
          type="submit"
          className={primary ? "button-primary w-full" : "button-quiet w-full"}
          disabled={navigation.state !== "idle"}
        >
          Complete build
        </button>
      </Form>
    </section>
  );
}
