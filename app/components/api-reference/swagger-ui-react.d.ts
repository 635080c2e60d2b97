/** The props of swagger-ui-react (which ships no types) that swagger-view.tsx sets. */
declare module "swagger-ui-react" {
  import type { ComponentType } from "react";

  const SwaggerUI: ComponentType<{
    url?: string;
    docExpansion?: "list" | "full" | "none";
    defaultModelsExpandDepth?: number;
    deepLinking?: boolean;
    tryItOutEnabled?: boolean;
    displayRequestDuration?: boolean;
  }>;
  export default SwaggerUI;
}
