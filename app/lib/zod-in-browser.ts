/**
 * Zod as the browser build resolves `import … from "zod"` (vite.config.ts aliases it
 * here for the client only): the same Zod, configured before any schema of the app is
 * made. Under the Content-Security-Policy (no 'unsafe-eval', docs/decisions/012) Zod's
 * probe for `new Function` is reported by browsers as a violation although Zod catches
 * it, so Zod runs without it. Doing this here rather than in root.tsx keeps Zod out of
 * the pages that use none (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
import { z } from "zod/v4";

z.config({ jitless: true });

export * from "zod/v4";
