/**
 * The one-time messages a page shows after an action ("Metal base saved.").
 * An action leaves a note naming its message by a code, with at most the id of
 * what it made or changed; the words come from this table, filled in with what
 * the server looks up by that id. Nothing the address or the cookie says is
 * ever shown, so no link can make the app claim what it did not do. Pure.
 */
import { countText } from "./unit-text";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
  movementTypeLabels,
} from "~/stock/stock-quantity-text";
import type { MovementType } from "~/db/tables/stock-enums";

interface StockAmount {
  sku: string;
  quantity: number;
  unit: string;
}

/** A movement as its message tells it. */
export interface MovementSubject {
  type: MovementType;
  sku: string;
  unit: string;
  /** How much moved, without its sign. */
  quantity: number;
  /** The change of stock at the location, with its sign (a count's difference to the books). */
  change: number;
  lot: string | null;
  location: string;
  /** Where a transfer went. */
  toLocation: string | null;
  /** The item's stock after the movement, all lots and locations. */
  onHandAfter: number;
}

/** What each kind of message is about, as the server looks it up from the note's id. */
export interface FlashSubjects {
  none: null;
  supplier: { name: string };
  grade: { name: string };
  movement: MovementSubject;
  order: {
    reference: string;
    /** Motors to build. */
    quantity: number;
    held: StockAmount[];
    short: StockAmount[];
  };
  /** An issue to a build order: the movement, the order and its line so far. */
  orderIssue: MovementSubject & {
    reference: string;
    issued: number;
    required: number;
  };
  /** A purchase order: its number, its supplier and where an order is e-mailed. */
  purchaseOrder: {
    number: string;
    supplier: string;
    orderEmail: string | null;
  };
  /** A design line after a change: its place, its wire and strands, its revision. */
  designLine: {
    position: number;
    sku: string;
    strands: number;
    revision: number;
  };
  /** A delivery received against a purchase order: the order, how many spools or lots, its status now. */
  purchaseReceipt: {
    reference: string;
    entries: number;
    statusLabel: string;
  };
  /** A lot after a hold or a release: its number, its item, why it is held (null when free). */
  lot: { number: string; sku: string; holdReason: string | null };
  /** A person's account, as an admin's messages name it. */
  person: { name: string; email: string };
  /** A design revision: its design's name and its number. */
  revision: { design: string; revision: number };
}

export type FlashSubjectKind = keyof FlashSubjects;

/** Each message and what it is about. */
export const flashMessageSubjects = {
  "metal-base-saved": "none",
  "currency-rate-saved": "none",
  "supplier-added": "supplier",
  "supplier-saved": "supplier",
  "grade-added": "grade",
  "item-created": "none",
  "item-reorder": "none",
  "item-rename": "none",
  "item-archive": "none",
  "item-restore": "none",
  "movement-recorded": "movement",
  "order-created": "none",
  "order-reserved": "order",
  "order-already-held": "order",
  "order-issued": "orderIssue",
  "order-cancelled": "order",
  "order-built": "order",
  "order-quantity-changed": "order",
  "order-quantity-changed-released": "order",
  "order-planned-start-changed": "order",
  "password-changed": "none",
  "display-settings-saved": "none",
  "purchase-order-created": "purchaseOrder",
  "purchase-order-from-alert": "purchaseOrder",
  "purchase-order-saved": "purchaseOrder",
  "purchase-order-sent": "purchaseOrder",
  "purchase-order-cancelled": "purchaseOrder",
  "purchase-order-closed": "purchaseOrder",
  "purchase-received": "purchaseReceipt",
  "wire-substitute-applied": "designLine",
  "lot-document-attached": "none",
  "lot-held": "lot",
  "lot-released": "lot",
  "stocktake-started": "none",
  "stocktake-cancelled": "none",
  "stocktake-approved": "none",
  "stocktake-recount-asked": "none",
  "stocktake-count-saved": "none",
  "stocktake-line-added": "none",
  "alert-mail-saved": "none",
  "token-revoked": "none",
  "password-set": "none",
  "person-invited": "person",
  "person-invited-mail-waiting": "person",
  "person-roles-saved": "person",
  "person-deactivated": "person",
  "person-reactivated": "person",
  "invitation-resent": "person",
  "invitation-waiting": "person",
  "design-created": "revision",
  "design-motor-saved": "none",
  "design-line-saved": "none",
  "design-line-removed": "none",
  "design-revision-released": "revision",
  "design-revision-started": "revision",
} as const satisfies Record<string, FlashSubjectKind>;

export type FlashCode = keyof typeof flashMessageSubjects;
type SubjectOf<Code extends FlashCode> =
  FlashSubjects[(typeof flashMessageSubjects)[Code]];

/**
 * How the note names its subject: a database id (a positive whole number), a
 * magnet grade's key or a person's id (text); messages about nothing in
 * particular carry no id.
 */
const idKinds = {
  none: "none",
  supplier: "number",
  grade: "key",
  movement: "number",
  order: "number",
  orderIssue: "number",
  purchaseOrder: "number",
  purchaseReceipt: "number",
  designLine: "number",
  lot: "number",
  person: "key",
  revision: "number",
} as const satisfies Record<FlashSubjectKind, "none" | "number" | "key">;

type IdOf<Kind extends FlashSubjectKind> = {
  none: undefined;
  number: number;
  key: string;
}[(typeof idKinds)[Kind]];

/** The note an action leaves for the next page: the code, and the id of its subject when it has one. */
export type FlashNote = {
  [Code in FlashCode]: IdOf<
    (typeof flashMessageSubjects)[Code]
  > extends undefined
    ? { code: Code }
    : { code: Code; id: IdOf<(typeof flashMessageSubjects)[Code]> };
}[FlashCode];

/** A message read from the note, ready to show; `key` is new for every note read. */
export interface ShownFlash {
  text: string;
  key: string;
}

const heldList = (amounts: StockAmount[]) =>
  amounts
    .map(
      (amount) =>
        `${formatStockQuantity(amount.quantity, amount.unit)} of ${amount.sku}`,
    )
    .join(", ");

/** A count or an adjustment tells its change with the sign ("difference −2 pieces"); other movements how much moved. */
const movedAmount = (movement: MovementSubject) =>
  movement.type === "count"
    ? `difference ${formatSignedStockQuantity(movement.change, movement.unit)}`
    : movement.type === "adjustment"
      ? formatSignedStockQuantity(movement.change, movement.unit)
      : formatStockQuantity(movement.quantity, movement.unit);

const place = (movement: MovementSubject) =>
  `${movement.lot ? ` lot ${movement.lot}` : ""} at ${movement.location}`;

const texts: {
  [Code in FlashCode]: (subject: SubjectOf<Code>) => string;
} = {
  "metal-base-saved": () => "Metal base saved.",
  "currency-rate-saved": () => "Currency rate saved.",
  "supplier-added": (supplier) => `Added the supplier ${supplier.name}.`,
  "supplier-saved": (supplier) => `Saved the supplier ${supplier.name}.`,
  "grade-added": (grade) => `Added the grade ${grade.name}.`,
  "item-created": () => "Added to the catalogue.",
  "item-reorder": () => "Reorder point and quantity saved.",
  "item-rename": () => "Name saved.",
  "item-archive": () =>
    "Archived: the item no longer shows in the stock list unless archived items are included.",
  "item-restore": () => "Restored to the stock list.",
  "movement-recorded": (movement) =>
    `${movementTypeLabels[movement.type]} recorded: ${movedAmount(movement)} of ${movement.sku}${place(movement)}${movement.toLocation ? ` → ${movement.toLocation}` : ""}. On hand now ${formatStockQuantity(movement.onHandAfter, movement.unit)}.`,
  "order-created": () =>
    "Build order made. Reserve its stock when the build is due.",
  "order-reserved": (order) =>
    `Held for ${order.reference}: ${heldList(order.held)}.${order.short.length > 0 ? ` Still short: ${heldList(order.short)}.` : ""}`,
  "order-already-held": (order) =>
    `Everything ${order.reference} still needs is already held.`,
  "order-issued": (issue) =>
    `Issued ${formatStockQuantity(issue.quantity, issue.unit)} of ${issue.sku}${place(issue)} to ${issue.reference}. Issued so far ${formatStockQuantity(issue.issued, issue.unit)} of ${formatStockQuantity(issue.required, issue.unit)}.`,
  "order-cancelled": (order) =>
    `${order.reference} cancelled. Whatever it held is free again.`,
  "order-built": (order) =>
    `${order.reference} built. Whatever it still held is free again.`,
  "order-quantity-changed": (order) =>
    `${order.reference} is now for ${countText(order.quantity, "motor")}.`,
  "order-quantity-changed-released": (order) =>
    `${order.reference} is now for ${countText(order.quantity, "motor")}. What it held was released: reserve again.`,
  "order-planned-start-changed": (order) =>
    `${order.reference}: planned start saved.`,
  "display-settings-saved": () =>
    "Saved: numbers, days and times now show your way.",
  "password-changed": () =>
    "Password changed. You stay signed in here; every other session has ended and your API tokens are revoked.",
  "purchase-order-created": (order) =>
    `${order.number} drafted for ${order.supplier}. Check the lines, then send it.`,
  "purchase-order-from-alert": (order) =>
    `${order.number} drafted for ${order.supplier} from the low-stock alert. Check the quantity and price, then send it.`,
  "purchase-order-saved": (order) => `${order.number} saved.`,
  "purchase-order-sent": (order) =>
    `${order.number} sent${order.orderEmail ? ` to ${order.orderEmail}` : ""} with the order as PDF and CSV. Its lines can no longer change.`,
  "purchase-order-cancelled": (order) => `${order.number} cancelled.`,
  "purchase-order-closed": (order) =>
    `${order.number} closed short: what was still open is no longer on order.`,
  "purchase-received": (receipt) =>
    `Received ${countText(receipt.entries, { one: "spool or lot", other: "spools or lots" })} against ${receipt.reference}. The order is now ${receipt.statusLabel.toLowerCase()}.`,
  "wire-substitute-applied": (line) =>
    `Line ${line.position} of revision ${line.revision} now winds ${line.strands} × ${line.sku} in hand. The revision is a draft: check its figures, then release it.`,
  "lot-document-attached": () => "Certificate attached to the lot.",
  "lot-held": (lot) =>
    `Lot ${lot.number} of ${lot.sku} is on hold${lot.holdReason ? `: ${lot.holdReason}` : ""}. It cannot be issued or reserved until it is released.`,
  "lot-released": (lot) =>
    `Lot ${lot.number} of ${lot.sku} is released: it can be issued and reserved again.`,
  "stocktake-started": () =>
    "Stocktake started: the book is recorded. Count on the blind sheet.",
  "stocktake-cancelled": () => "Stocktake cancelled. Nothing was posted.",
  "stocktake-approved": () =>
    "Stocktake approved: its differences are posted as count movements.",
  "stocktake-recount-asked": () =>
    "Recount asked: the line's count is cleared until it is counted again.",
  "stocktake-count-saved": () => "Count saved.",
  "stocktake-line-added": () => "Line added to the sheet: count it now.",
  "alert-mail-saved": () => "Low-stock e-mail choice saved.",
  "token-revoked": () => "Token revoked: it no longer works.",
  "password-set": () => "Password saved: you are signed in.",
  "person-invited": (person) => `Invitation sent to ${person.email}.`,
  "person-invited-mail-waiting": (person) =>
    `Account created for ${person.email}; the e-mail could not be sent yet and waits in the outbox.`,
  "person-roles-saved": (person) =>
    `Roles saved. ${person.name} is signed out everywhere and their API tokens are revoked.`,
  "person-deactivated": (person) =>
    `${person.name} is deactivated, signed out everywhere, and their API tokens are revoked.`,
  "person-reactivated": (person) => `${person.name} can sign in again.`,
  "invitation-resent": (person) =>
    `A new link is on its way to ${person.email}; earlier links no longer work.`,
  "invitation-waiting": (person) =>
    `The new link for ${person.email} waits in the outbox: SMTP did not accept it.`,
  "design-created": (revision) =>
    `${revision.design} created: revision ${revision.revision} is a draft, add its lines.`,
  "design-motor-saved": () => "Motor figures saved.",
  "design-line-saved": () => "Line saved.",
  "design-line-removed": () =>
    "Line removed: the lines after it moved up one place.",
  "design-revision-released": (revision) =>
    `Revision ${revision.revision} of ${revision.design} is released: it is read-only from now on.`,
  "design-revision-started": (revision) =>
    `Revision ${revision.revision} of ${revision.design} started as a draft.`,
};

/** The words of a message, from the table and the subject the server looked up. */
export function flashText<Code extends FlashCode>(
  code: Code,
  subject: SubjectOf<Code>,
): string {
  return texts[code](subject);
}

/** What a note's message is about. */
export function subjectKindOf(note: FlashNote): FlashSubjectKind {
  return flashMessageSubjects[note.code];
}

const gradeKeyLength = 40;

function isFlashCode(value: unknown): value is FlashCode {
  return (
    typeof value === "string" && Object.hasOwn(flashMessageSubjects, value)
  );
}

/**
 * A note read back from the cookie, or null when it is not one the app writes:
 * an unknown code, an id of the wrong kind, or any other field.
 */
export function readFlashNote(value: unknown): FlashNote | null {
  if (!value || typeof value !== "object" || Array.isArray(value)) return null;
  const { code, id, ...rest } = value as Record<string, unknown>;
  if (Object.keys(rest).length > 0 || !isFlashCode(code)) return null;
  switch (idKinds[flashMessageSubjects[code]]) {
    case "none":
      return id === undefined ? ({ code } as FlashNote) : null;
    case "number":
      return typeof id === "number" && Number.isSafeInteger(id) && id > 0
        ? ({ code, id } as FlashNote)
        : null;
    case "key":
      return typeof id === "string" &&
        id.length > 0 &&
        id.length <= gradeKeyLength
        ? ({ code, id } as FlashNote)
        : null;
  }
}
