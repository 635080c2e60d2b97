/**
 * The one way a form's fields are read against its Zod schema, in the browser and
 * on the server: Conform's parseWithZod, with number fields read in the reader's
 * locale (app/lib/number-text.ts formNumber: "1,25" in de-DE, "1.25" in en-GB)
 * instead of JavaScript's Number(), which knows only the point. A number field
 * holding text that is ambiguous there ("1.250" in de-DE, "1,250" in en-GB) gets a
 * message of its own that says why, instead of the field's "must be a number".
 */
import { parseWithZod } from "@conform-to/zod/v4";
import { configureCoercion } from "@conform-to/zod/v4/future";
import { ambiguousNumberMessage, formNumber } from "./number-text";

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
type Issue = {
  code: string;
  expected?: string;
  path: PropertyKey[];
  message: string;
};

/** A field's name as the form writes it, from an issue's path: "lines[0].quantity". */
function fieldName(path: PropertyKey[]): string {
  return path.reduce<string>(
    (name, part) =>
      typeof part === "number"
        ? `${name}[${part}]`
        : name === ""
          ? String(part)
          : `${name}.${String(part)}`,
    "",
  );
}

/**
 * The field's messages: a number field refused because its text is ambiguous in the
 * reader's locale says so, once, in place of the field's own "must be a number".
 */
function withAmbiguousNumbers(
  payload: FormData | URLSearchParams,
  format: (issues: Issue[]) => string[],
): (issues: Issue[]) => string[] {
  return (issues) => {
    const notNumber = issues.find(
      (issue) =>
        issue.code === "invalid_type" &&
        issue.expected === "number" &&
        issue.path.length > 0,
    );
    const ambiguous = notNumber
      ? ambiguousNumberMessage(payload.get(fieldName(notNumber.path)))
      : null;
    if (!ambiguous) return format(issues);
    return [
      ambiguous,
      ...format(issues.filter((issue) => issue !== notNumber)),
    ];
  };
}

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
    formatError: withAmbiguousNumbers(
      payload,
      (options.formatError as ((issues: Issue[]) => string[]) | undefined) ??
        ((issues) => issues.map((issue) => issue.message)),
    ),
    schema:
      typeof schema === "function"
        ? (intent: Parameters<typeof schema>[0]) =>
            coerceFormValue(schema(intent))
        : coerceFormValue(schema),
  } as ParseOptions);
}) as typeof parseWithZod;
