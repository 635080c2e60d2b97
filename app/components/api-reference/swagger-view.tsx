/**
 * The API document rendered by Swagger UI (swagger-ui-react, bundled with the
 * app). Loaded only by the /api page, and only in the browser
 * (api-reference-viewer.tsx), so no other page's JavaScript carries it.
 * "Try it out" sends same-origin requests: the browser adds the person's own
 * session cookie, and the app's Origin on writes (docs/decisions/047).
 */
import { useEffect, useRef } from "react";
import SwaggerUI from "swagger-ui-react";
import "swagger-ui-react/swagger-ui.css";
import "./swagger-view.css";

export default function SwaggerView({ documentUrl }: { documentUrl: string }) {
  const container = useRef<HTMLDivElement>(null);
  useEffect(() => nameUnlabelledSelects(container.current), []);
  return (
    <div ref={container} className="api-reference">
      <SwaggerUI
        url={documentUrl}
        // Operations folded; the person opens the ones they want.
        docExpansion="list"
        defaultModelsExpandDepth={0}
        deepLinking={false}
        tryItOutEnabled={false}
        displayRequestDuration
      />
    </div>
  );
}

/**
 * Swagger UI draws the server choice and a parameter's list of values as a
 * <select> with no label. Each gets a name a screen reader can say (the
 * parameter's, or "Server"), now and whenever an operation is opened.
 */
function nameUnlabelledSelects(
  root: HTMLElement | null,
): (() => void) | undefined {
  if (!root) return undefined;
  const name = () => {
    for (const select of root.querySelectorAll("select:not([aria-label])")) {
      const parameter = select.closest("tr[data-param-name]");
      const label = parameter
        ? `${parameter.getAttribute("data-param-name")} (${parameter.getAttribute("data-param-in")})`
        : select.id === "servers"
          ? "Server"
          : null;
      if (label) select.setAttribute("aria-label", label);
    }
  };
  name();
  const observer = new MutationObserver(name);
  observer.observe(root, { childList: true, subtree: true });
  return () => observer.disconnect();
}
