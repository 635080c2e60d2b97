/**
 * The one way a form's fields are read against its Zod schema, in the browser and
 * on the server: Conform's parseWithZod, with number fields read in the reader's
 * locale (app/lib/number-text.ts formNumber: "1,25" in de-DE, "1.25" in en-GB)
 * instead of JavaScript's Number(), which knows only the point.
 */
import { parseWithZod } from "@conform-to/zod/v4";
import { configureCoercion } from "@conform-to/zod/v4/future";
import { formNumber } from "./number-text";

const { coerceFormValue } = configureCoercion({
  type: {
    number(text) {
      const value = formNumber(text);
      // Text that is no number (or is ambiguous) fails the schema's number check.
      return typeof value === "number" ? value : Number.NaN;
    },
  },
});

type ParseOptions = Parameters<typeof parseWithZod>[1];

/** parseWithZod with locale-aware numbers; same options, same result. */
export const parseForm: typeof parseWithZod = ((
  payload: FormData | URLSearchParams,
  options: ParseOptions,
) => {
  if (options.disableAutoCoercion) return parseWithZod(payload, options);
  const { schema } = options;
  return parseWithZod(payload, {
    ...options,
    disableAutoCoercion: true,
    schema:
      typeof schema === "function"
        ? (intent: Parameters<typeof schema>[0]) =>
            coerceFormValue(schema(intent))
        : coerceFormValue(schema),
  } as ParseOptions);
}) as typeof parseWithZod;
