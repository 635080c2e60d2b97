/**
 * How the browser build puts the app's own modules into chunks: every app module
 * (app/**, not a route module) that only the root route or only a layout route loads
 * goes into one chunk beside that route ("root-modules", "app-shell-modules").
 *
 * The bundler's automatic chunking gives each set of importers a chunk of its own, and
 * it counts the chunks loaded later with import() (a lazy table, chart or panel) as
 * importers too. So the app shell's helpers (formatting, the menu, roles, flash
 * messages), which every signed-in page loads anyway, came as six chunks of about
 * 1 KB, and on Lighthouse's slow 4G each costs a round trip before the first paint
 * (issue 23). Gathered, every page under the shell loads four scripts fewer and a
 * little less code (fewer import lines between chunks).
 *
 * Only the layouts' modules are gathered: the module graph the bundler shows here
 * lists every import statement, also those whose bindings the browser's code never
 * uses (they are dropped later), so a wider rule (a chunk per set of pages) moved
 * code into pages that never ran it. A layout's modules are loaded by every page
 * inside it in any case. A module something loads with import() (and what only it
 * reaches) stays with the bundler, so nothing loaded later joins a first load.
 * See docs/decisions/058-app-module-chunks.md.
 */
import path from "node:path";
import type { Plugin } from "vite";

/** What the bundler tells about one module while it chunks (Rolldown's ChunkingContext). */
interface ModuleFacts {
  isEntry: boolean;
  importers: string[];
  dynamicImporters: string[];
}
interface ModuleGraph {
  getModuleInfo(moduleId: string): ModuleFacts | null;
}

/** A layout route and the route modules inside it (files relative to the app folder). */
export interface LayoutRoutes {
  layout: string;
  inside: string[];
}

/**
 * The chunk of an app module, for Rolldown's `output.codeSplitting.groups[].name`:
 * "<layout>-modules" when only that layout (or root) loads it, else null (the
 * bundler decides), always null for route modules and files outside the app folder.
 */
export function appModuleChunkName(
  appFolder: string,
  layouts: LayoutRoutes[],
): (moduleId: string, graph: ModuleGraph) => string | null {
  const folder = path.resolve(appFolder);
  const relative = (id: string) => path.relative(folder, id.split("?")[0]!);
  const inApp = (id: string) =>
    id.startsWith(folder + path.sep) && /\.(ts|tsx)$/.test(id.split("?")[0]!);
  const layoutFiles = new Set(layouts.map(({ layout }) => layout));

  /** The route modules that reach `id` through static imports. */
  function pagesLoading(id: string, graph: ModuleGraph): Set<string> {
    const pages = new Set<string>();
    const seen = new Set<string>();
    const walk = (current: string) => {
      if (seen.has(current)) return;
      seen.add(current);
      const facts = graph.getModuleInfo(current);
      if (!facts) return;
      // A module also loaded with import() may be imported statically only for the
      // server's render (DataTable's view): an import the browser's code never uses
      // but the graph still lists. The pages loading it are not counted through it.
      if (facts.dynamicImporters.length > 0) return;
      if (facts.isEntry) pages.add(relative(current));
      for (const importer of facts.importers) walk(importer);
    };
    walk(id);
    return pages;
  }

  return (moduleId, graph) => {
    if (!inApp(moduleId)) return null;
    if (graph.getModuleInfo(moduleId)?.isEntry !== false) return null;
    const pages = pagesLoading(moduleId, graph);
    // A page inside a layout loads the layout: it adds nothing to the set.
    for (const { layout, inside } of layouts)
      if (pages.has(layout)) for (const page of inside) pages.delete(page);
    const [only] = pages;
    return pages.size === 1 && layoutFiles.has(only!)
      ? `${path.basename(only!).replace(/\.(ts|tsx)$/, "")}-modules`
      : null;
  };
}

/** One entry of app/routes.ts (React Router's RouteConfigEntry, the parts read here). */
interface RouteEntry {
  file: string;
  children?: RouteEntry[];
}

/** Root (around every route) and each layout of app/routes.ts, with the routes inside it. */
export function layoutRoutes(routes: RouteEntry[]): LayoutRoutes[] {
  const filesIn = (entries: RouteEntry[]): string[] =>
    entries.flatMap((entry) => [entry.file, ...filesIn(entry.children ?? [])]);
  const layouts: LayoutRoutes[] = [
    { layout: "root.tsx", inside: filesIn(routes) },
  ];
  const visit = (entries: RouteEntry[]) => {
    for (const entry of entries) {
      if (!entry.children?.length) continue;
      layouts.push({ layout: entry.file, inside: filesIn(entry.children) });
      visit(entry.children);
    }
  };
  visit(routes);
  return layouts;
}

/**
 * The plugin that lets the bundler add exports to a route module's chunk: with
 * `includeDependenciesRecursively: false` Rolldown asks for
 * `preserveEntrySignatures: "allow-extension"` (React Router sets "exports-only").
 * A route chunk keeps every export React Router reads.
 */
export function allowEntryExtension(): Plugin {
  return {
    name: "turnledger:allow-entry-extension",
    apply: "build",
    enforce: "post",
    options(options) {
      return { ...options, preserveEntrySignatures: "allow-extension" };
    },
  };
}
