/**
 * A Vite plugin for the browser build: tells the bundler that the app's own modules
 * (app/**\/*.ts, *.tsx) do nothing when they are loaded but define things, so a module
 * none of whose exports a page uses is left out of that page's JavaScript whole, with
 * the libraries it calls at its top level. Without it, a page that imports one
 * constant or helper from a module that also builds a Zod schema at its top level
 * (`z.object(...)` is a call the bundler must assume has effects) loads all of Zod.
 * lib/zod-in-browser.ts is the exception: it configures Zod when it loads. A module
 * of the app that must run for its effects in the browser belongs beside it here.
 * See docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import path from "node:path";
import type { Plugin } from "vite";

const runsForItsEffects = new Set(["lib/zod-in-browser.ts"]);

export function sideEffectFreeAppModules(appFolder: string): Plugin {
  const folder = path.resolve(appFolder);
  return {
    name: "turnledger:side-effect-free-app-modules",
    apply: "build",
    transform: {
      order: "post",
      handler(code, id) {
        const file = id.split("?")[0]!;
        if (!file.startsWith(folder + path.sep)) return null;
        if (!/\.(ts|tsx)$/.test(file)) return null;
        if (runsForItsEffects.has(path.relative(folder, file))) return null;
        // The code and its mapping stay as they are (map: null keeps the existing one).
        return { code, map: null, moduleSideEffects: false };
      },
    },
  };
}
