import { useState } from "react";
import { useLocation, useRouteLoaderData } from "react-router";
import type { ShownFlash } from "~/lib/flash-messages";
import type { loader as appShellLoader } from "~/routes/app-shell";

/**
 * The one-time message the app shell took with this page's data, or null. Its
 * key is new for every message: a form keyed on it starts afresh after its save.
 */
export function useFlash(): ShownFlash | null {
  return (
    useRouteLoaderData<typeof appShellLoader>("routes/app-shell")?.flash ?? null
  );
}

/**
 * The status line with the message after an action, at the top of every page
 * in the app shell. The region (role="status", a polite live region) is always
 * there, empty between messages, so a screen reader announces a message that
 * arrives after a client-side submission instead of missing a region that
 * appeared with its words already in it. The shell's data stays while people
 * move on inside the app, so the message shows only on the page it arrived with.
 */
export function FlashMessage({ flash }: { flash: ShownFlash | null }) {
  return (
    <div
      role="status"
      aria-live="polite"
      aria-atomic="true"
      className="print:hidden"
    >
      {flash ? <FlashLine key={flash.key} text={flash.text} /> : null}
    </div>
  );
}

function FlashLine({ text }: { text: string }) {
  const location = useLocation();
  const [arrivedAt] = useState(location.key);
  if (location.key !== arrivedAt) return null;
  return (
    <p className="mb-6 flex items-start gap-3 rounded-md border border-ok/40 border-l-4 border-l-ok bg-sheet px-4 py-3 text-sm text-graphite-900 shadow-sm">
      <svg
        aria-hidden="true"
        viewBox="0 0 20 20"
        className="mt-0.5 h-4 w-4 shrink-0 fill-ok"
      >
        <path d="M10 1.5a8.5 8.5 0 1 0 0 17 8.5 8.5 0 0 0 0-17Zm4.03 6.28-4.75 5.5a.75.75 0 0 1-1.1.04l-2.25-2.25a.75.75 0 1 1 1.06-1.06l1.68 1.68 4.22-4.89a.75.75 0 1 1 1.14.98Z" />
      </svg>
      <span>{text}</span>
    </p>
  );
}
