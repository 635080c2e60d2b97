/**
 * A page of labels: a bar to print, change the size or go back (not printed), and the
 * labels at their real size. The page's own style sets the paper: one 62 × 100 mm label per
 * page for a label printer, or an A4 sheet of six with cutting lines. The app's header and
 * footer are left off the paper.
 */
import { Link } from "react-router";
import {
  labelSizeNames,
  labelSizes,
  type LabelSize,
} from "~/labels/label-sizes";

const pageStyles: Record<LabelSize, string> = {
  "62x100": `@page { size: 62mm 100mm; margin: 0; }
.label-sheet { display: flex; flex-wrap: wrap; gap: 6mm; }
@media print {
  .label-sheet { display: block; }
  .label { break-after: page; border: 0 !important; }
  .label:last-child { break-after: auto; }
}`,
  a4: `@page { size: A4; margin: 8mm; }
.label-sheet { display: grid; grid-template-columns: repeat(3, 62mm); gap: 4mm; }
@media print { .label { border: 0.2mm dashed #64748b !important; } }`,
};

const printOnlyTheLabels = `@media print {
  body > div > header, body > div > footer { display: none !important; }
  main { padding: 0 !important; margin: 0 !important; max-width: none !important; }
  body { background: #fff !important; }
}`;

export function LabelSheet({
  title,
  size,
  back,
  sizeHref,
  related,
  children,
}: {
  title: string;
  size: LabelSize;
  back: { to: string; text: string } | null;
  /** The same page in another size. */
  sizeHref: (size: LabelSize) => string;
  /** Another printout of the same thing (a location's count sheet), beside Print. */
  related?: { to: string; text: string };
  children: React.ReactNode;
}) {
  return (
    <div className="space-y-6">
      <style>{`${pageStyles[size]}\n${printOnlyTheLabels}`}</style>
      <div className="space-y-3 print:hidden">
        {back ? (
          <Link
            to={back.to}
            className="text-sm text-copper-700 underline underline-offset-2"
          >
            ← {back.text}
          </Link>
        ) : null}
        <h1 className="text-2xl font-semibold">{title}</h1>
        <div className="flex flex-wrap items-center gap-3">
          <button
            type="button"
            className="button-primary"
            onClick={() => window.print()}
          >
            Print
          </button>
          <nav aria-label="Label size" className="flex flex-wrap gap-2 text-sm">
            {labelSizes.map((each) =>
              each === size ? (
                <span
                  key={each}
                  aria-current="page"
                  className="rounded-md bg-graphite-800 px-3 py-1.5 text-white"
                >
                  {labelSizeNames[each]}
                </span>
              ) : (
                <Link
                  key={each}
                  to={sizeHref(each)}
                  className="rounded-md border border-graphite-300 px-3 py-1.5 text-copper-700 hover:border-copper-400"
                >
                  {labelSizeNames[each]}
                </Link>
              ),
            )}
          </nav>
          {related ? (
            <Link
              to={related.to}
              className="text-sm font-medium text-copper-700 underline underline-offset-2"
            >
              {related.text}
            </Link>
          ) : null}
        </div>
        <p className="text-sm text-graphite-600">
          Print at 100 % (no &ldquo;fit to page&rdquo;) so the QR codes keep
          their size. The printed text under each QR code can be typed in where
          a scanner is missing.
        </p>
      </div>
      <div className="label-sheet">{children}</div>
    </div>
  );
}

/** The QR code of a label and its code in text beneath, as a scanner or a person reads it. */
export function LabelCode({
  scan,
  sizeMm,
  what,
}: {
  scan: { text: string; url: string; qrSvg: string };
  sizeMm: number;
  what: string;
}) {
  return (
    <figure className="flex flex-col items-center">
      <div
        role="img"
        aria-label={`QR code of ${what}: ${scan.text}`}
        data-scan-url={scan.url}
        className="label-qr"
        style={{ width: `${sizeMm}mm`, height: `${sizeMm}mm` }}
        // Made on the server by the qrcode package from our own address: no user text in it.
        dangerouslySetInnerHTML={{ __html: scan.qrSvg }}
      />
      <figcaption className="font-mono text-[3.6mm] font-semibold tracking-wide">
        {scan.text}
      </figcaption>
    </figure>
  );
}

/** One label's frame: 62 × 100 mm, white, a thin border on screen. */
export function LabelFrame({
  label,
  children,
}: {
  label: string;
  children: React.ReactNode;
}) {
  return (
    <article
      aria-label={label}
      className="label flex flex-col overflow-hidden border border-graphite-300 bg-white p-[3mm] text-black break-inside-avoid"
      style={{ width: "62mm", height: "100mm" }}
    >
      {children}
    </article>
  );
}
