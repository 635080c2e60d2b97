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
 * The green box with the message after an action. The shell's data stays while
 * people move on inside the app, so the box shows only on the page the message
 * arrived with.
 */
export function FlashMessage({ flash }: { flash: ShownFlash | null }) {
  return flash ? <FlashBox key={flash.key} text={flash.text} /> : null;
}

function FlashBox({ text }: { text: string }) {
  const location = useLocation();
  const [arrivedAt] = useState(location.key);
  if (location.key !== arrivedAt) return null;
  return (
    <p
      role="status"
      className="mb-6 rounded-md border border-ok/40 bg-ok/10 px-4 py-3 text-ok print:hidden"
    >
      {text}
    </p>
  );
}
