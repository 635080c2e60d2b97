/**
 * A form's checks in the browser, loaded with import() once the page runs: the
 * form's Zod schema and Conform's Zod adapter (parseForm) are not first-load
 * JavaScript (docs/decisions/051-precompressed-assets-and-page-weight.md). Until
 * they have come (moments after hydration) a form is checked by the server's
 * action, as without JavaScript, and shows the same field messages from its
 * lastResult. The field constraints (required, lengths) come from the loader
 * (`getZodConstraint` on the server), so the first render has them.
 *
 *   const validate = useBrowserValidation(() =>
 *     import("~/lib/account-schemas").then((module) => module.signInSchema));
 *   useForm({ …, onValidate: validate });
 *
 * `options` are parseForm's other options (e.g. `{ disableAutoCoercion: true }`),
 * the same the action parses with.
 */
import type { Submission } from "@conform-to/react";
import type { getZodConstraint } from "@conform-to/zod/v4";
import { useEffect, useRef, useState } from "react";
import type { z } from "zod";

/** A form's field constraints as the loader gives them: `getZodConstraint(schema)`. */
export type FormConstraint = ReturnType<typeof getZodConstraint>;

type Validate<Schema extends z.ZodType> = (context: {
  formData: FormData;
}) => Submission<z.input<Schema>, string[], z.output<Schema>>;

export function useBrowserValidation<Schema extends z.ZodType>(
  loadSchema: () => Promise<Schema>,
  options: { disableAutoCoercion?: boolean } = {},
): Validate<Schema> | undefined {
  const load = useRef(loadSchema);
  const { disableAutoCoercion } = options;
  const [validate, setValidate] = useState<Validate<Schema>>();
  useEffect(() => {
    let current = true;
    void Promise.all([import("~/lib/parse-form"), load.current()]).then(
      ([{ parseForm }, schema]) => {
        if (!current) return;
        setValidate(
          () =>
            ({ formData }: { formData: FormData }) =>
              parseForm(formData, { schema, disableAutoCoercion }),
        );
      },
    );
    return () => {
      current = false;
    };
  }, [disableAutoCoercion]);
  return validate;
}
