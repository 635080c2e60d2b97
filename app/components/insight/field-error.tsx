/** A field's messages under it, tied to the input by `id` (aria-describedby). */
export function FieldError({
  id,
  messages,
}: {
  id: string;
  messages?: string[];
}) {
  return messages ? (
    <p id={id} className="field-error">
      {messages.join(" ")}
    </p>
  ) : null;
}
