/**
 * The API document rendered by Swagger UI (swagger-ui-react, bundled with the
 * app). Loaded only by the /api page, and only in the browser
 * (api-reference-viewer.tsx), so no other page's JavaScript carries it.
 * "Try it out" sends same-origin requests: the browser adds the person's own
 * session cookie, and the app's Origin on writes (docs/decisions/0XX).
 */
import SwaggerUI from "swagger-ui-react";
import "swagger-ui-react/swagger-ui.css";
import "./swagger-view.css";

export default function SwaggerView({
  documentUrl,
}: {
  documentUrl: string;
}) {
  return (
    <div className="api-reference">
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
