/**
 * What a scan fills on the receive-against-order form. A bin or store label fills the
 * location of the spool or lot last worked on (every entry when none was); a lot's label
 * fills the lot number and location of the first entry of that lot's item still without a
 * lot number. A lot of an item the order does not have fills nothing.
 */
import type { ScanOutcome } from "~/components/labels/scan-panel";
import type { ScanLookupAnswer } from "~/labels/label-types";

export interface ReceiveEntry {
  /** Position in the form's list of entries (`lines[i]`). */
  index: number;
  sku: string;
  /** "spool 2 of line 1", for the words. */
  name: string;
}

function control(form: HTMLFormElement, name: string) {
  const found = form.elements.namedItem(name);
  return found instanceof HTMLInputElement || found instanceof HTMLSelectElement
    ? found
    : null;
}

/** Chooses the location in a select when it is one of its options (codes compare without case). */
function chooseLocation(
  select: HTMLSelectElement | HTMLInputElement | null,
  code: string,
) {
  if (!(select instanceof HTMLSelectElement)) return false;
  const option = [...select.options].find(
    (each) => each.value.toUpperCase() === code.toUpperCase(),
  );
  if (!option) return false;
  select.value = option.value;
  return true;
}

export function fillReceiveFormFromScan(
  form: HTMLFormElement,
  entries: ReceiveEntry[],
  lastWorkedOn: number | null,
  answer: ScanLookupAnswer,
  orderNumber: string,
): ScanOutcome {
  if (answer.kind === "location") {
    const targets = entries.filter(
      (entry) => lastWorkedOn === null || entry.index === lastWorkedOn,
    );
    const filled = targets.filter((entry) =>
      chooseLocation(
        control(form, `lines[${entry.index}].location`),
        answer.code,
      ),
    );
    if (filled.length === 0)
      return {
        filled: false,
        text: `Location ${answer.code} cannot be chosen here. Nothing was filled.`,
      };
    return {
      filled: true,
      text: `Location ${answer.code} (${answer.name}) filled for ${
        filled.length === 1 ? filled[0]!.name : "every spool and lot"
      }.`,
    };
  }
  const ofItem = entries.filter((entry) => entry.sku === answer.sku);
  if (ofItem.length === 0)
    return {
      filled: false,
      text: `Lot ${answer.lot} is of ${answer.sku}, which ${orderNumber} does not order. Nothing was filled.`,
    };
  const target =
    ofItem.find(
      (entry) => !control(form, `lines[${entry.index}].lot`)?.value.trim(),
    ) ?? ofItem[0]!;
  const lot = control(form, `lines[${target.index}].lot`);
  if (lot) lot.value = answer.lot;
  const located =
    answer.location !== null &&
    chooseLocation(
      control(form, `lines[${target.index}].location`),
      answer.location,
    );
  return {
    filled: true,
    text: `Lot ${answer.lot} of ${answer.sku} filled for ${target.name}${located ? ` at ${answer.location}` : ""}.`,
  };
}
