/** A wire's or a magnet's attributes on its item page, and for a magnet the handling caution. */
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import {
  MagnetAttributeList,
  WireAttributeList,
  type MagnetAttributes,
  type WireAttributes,
} from "~/components/stock-item-attributes";

export function ItemAttributesPanel({
  attributes,
  onHand,
}: {
  attributes: WireAttributes | MagnetAttributes;
  /** On hand of the item: kg of a wire, pieces of a magnet. */
  onHand: number;
}) {
  return (
    <>
      <section aria-labelledby="attributes-heading" className="panel">
        <h2 id="attributes-heading" className="mb-2 text-lg font-semibold">
          {attributes.kind === "wire" ? "Wire" : "Magnet"}
        </h2>
        {attributes.kind === "wire" ? (
          <WireAttributeList wire={attributes} onHandKg={onHand} />
        ) : (
          <MagnetAttributeList magnet={attributes} pieces={onHand} />
        )}
      </section>
      {attributes.kind === "magnet" ? <MagnetHandlingCaution /> : null}
    </>
  );
}
