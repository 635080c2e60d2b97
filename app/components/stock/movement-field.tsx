/**
 * The record-movement page's fields: a large measure field named `movement-<name>`, and
 * the large input class its searches and choices share.
 */
import { MeasureField } from "~/components/measure-field";

/** A large input for the bench: the SKU search and the location choices. */
export const movementInputClass = "field-input text-lg min-h-12";

export function MovementField(
  props: Omit<React.ComponentProps<typeof MeasureField>, "id">,
) {
  return <MeasureField id={`movement-${props.name}`} {...props} />;
}
