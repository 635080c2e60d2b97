/**
 * The one layout of Turnledger's printable pages (count sheets, pick lists, a BOM, a
 * purchase order): a bar with the way back and the Print button, left off the paper, and
 * the page's sheet. `PrintSheet` is the A4 sheet itself: a heading with the facts a
 * reader needs on paper (reference, what, when printed) above the page's tables. The
 * app's header is never printed (the shell marks it so); its footer keeps the cautions.
 */
import { BackLink } from "./back-link";

/** The bar above a printable page: back to where it came from, and Print. Not printed. */
export function PrintBar({ back }: { back: { to: string; text: string } }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
      <span className="text-sm">
        <BackLink to={back.to}>{back.text}</BackLink>
      </span>
      <button
        type="button"
        className="button-primary"
        onClick={() => window.print()}
      >
        Print
      </button>
    </div>
  );
}

export interface PrintFact {
  label: string;
  value: React.ReactNode;
}

/**
 * A printable page on A4: the bar, then the sheet with its heading and facts
 * ("Printed 3 Dec 2026, 14:05"), then `children`.
 */
export function PrintSheet({
  back,
  title,
  facts,
  aside,
  children,
}: {
  back: { to: string; text: string };
  title: string;
  /** What the paper must say about itself, beside the title. */
  facts: PrintFact[];
  /** Beside the heading on the right: a scan code, say. */
  aside?: React.ReactNode;
  children: React.ReactNode;
}) {
  return (
    <div className="space-y-5">
      <style>{"@page { size: A4 portrait; margin: 12mm; }"}</style>
      <PrintBar back={back} />
      <article className="print-sheet mx-auto max-w-[190mm] bg-white p-6 text-sm text-graphite-900 shadow-xs print:max-w-none print:p-0 print:shadow-none">
        <header className="mb-4 flex items-start justify-between gap-4 border-b-2 border-graphite-900 pb-2">
          <div>
            <h1 className="text-xl font-semibold">{title}</h1>
            <dl className="mt-1 flex flex-wrap gap-x-5 gap-y-0.5">
              {facts.map((fact) => (
                <div key={fact.label} className="flex gap-1">
                  <dt className="text-graphite-500">{fact.label}</dt>
                  <dd className="font-medium">{fact.value}</dd>
                </div>
              ))}
            </dl>
          </div>
          {aside}
        </header>
        {children}
      </article>
    </div>
  );
}

/** A cell left blank for a pen: counted quantities, initials, a tick. */
export const writeInCell =
  "h-9 border border-graphite-700 print:border-graphite-700";

/** A header or text cell of a printed table. */
export const printCell = "border border-graphite-700 px-2 py-1";
