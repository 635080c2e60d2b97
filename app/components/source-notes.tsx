/**
 * Sources of reference rows as numbered notes: each row carries a short
 * reference ("[2]") to a note listed under its table, so a source shared by a
 * hundred rows is written once.
 */

/** Numbers the distinct sources in order of first appearance, from 1. */
export function numberSources(sources: readonly string[]): Map<string, number> {
  const numbers = new Map<string, number>();
  for (const source of sources) {
    if (!numbers.has(source)) numbers.set(source, numbers.size + 1);
  }
  return numbers;
}

function noteId(prefix: string, number: number): string {
  return `${prefix}-source-${number}`;
}

/** A link to a numbered source note, e.g. "[2]". */
export function SourceRef({
  notes,
  prefix,
  source,
}: {
  notes: Map<string, number>;
  prefix: string;
  source: string;
}) {
  const number = notes.get(source);
  if (number === undefined) return null;
  return (
    <a
      href={`#${noteId(prefix, number)}`}
      className="text-copper-700 underline underline-offset-2 hover:decoration-2"
      aria-label={`Source ${number}`}
      title={source}
    >
      [{number}]
    </a>
  );
}

/** The numbered list of sources under a table. */
export function SourceList({
  notes,
  prefix,
}: {
  notes: Map<string, number>;
  prefix: string;
}) {
  return (
    <section
      aria-labelledby={`${prefix}-sources`}
      className="text-sm text-graphite-700"
    >
      <h3 id={`${prefix}-sources`} className="font-semibold text-graphite-800">
        Sources
      </h3>
      <ol className="mt-1 space-y-1">
        {[...notes].map(([source, number]) => (
          <li
            key={number}
            id={noteId(prefix, number)}
            className="flex gap-2 target:bg-copper-50"
          >
            <span className="text-graphite-500">[{number}]</span>
            <span>{source}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}
