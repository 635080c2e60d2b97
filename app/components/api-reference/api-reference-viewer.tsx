import { lazy, Suspense, useSyncExternalStore } from "react";

/** Swagger UI and its styles: a chunk of their own, fetched when the /api page runs. */
const SwaggerView = lazy(() => import("./swagger-view"));

/**
 * The rendered API document. The server sends only a note that it is on its
 * way: the viewer runs in the browser alone, loaded after the page hydrates.
 */
export function ApiReferenceViewer({ documentUrl }: { documentUrl: string }) {
  // False in the server's render and while hydrating, true in the browser after.
  const inBrowser = useSyncExternalStore(
    neverChanges,
    () => true,
    () => false,
  );
  const loading = (
    <p role="status" className="text-sm text-graphite-500">
      Loading the operations…
    </p>
  );
  return inBrowser ? (
    <Suspense fallback={loading}>
      <SwaggerView documentUrl={documentUrl} />
    </Suspense>
  ) : (
    loading
  );
}

function neverChanges(): () => void {
  return () => undefined;
}
