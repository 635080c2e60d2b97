import path from "node:path";
import { describe, expect, it } from "vitest";
import { appModuleChunkName, layoutRoutes } from "./app-module-chunks";

const app = path.resolve("app");
const file = (name: string) => path.join(app, name);

/** A module graph as Rolldown shows it while chunking: who imports whom. */
function graph(
  modules: Record<
    string,
    { entry?: boolean; importers?: string[]; lazyImporters?: string[] }
  >,
) {
  return {
    getModuleInfo(id: string) {
      const name = path.relative(app, id);
      const module = modules[name];
      if (!module) return null;
      return {
        isEntry: module.entry ?? false,
        importers: (module.importers ?? []).map(file),
        dynamicImporters: (module.lazyImporters ?? []).map(file),
      };
    },
  };
}

const routes = [
  { file: "routes/sign-in.tsx" },
  {
    file: "routes/app-shell.tsx",
    children: [{ file: "routes/stock.tsx" }, { file: "routes/insight.tsx" }],
  },
];
const chunkOf = appModuleChunkName("app", layoutRoutes(routes));

describe("the chunks of the app's modules", () => {
  const modules = graph({
    "root.tsx": { entry: true },
    "routes/sign-in.tsx": { entry: true },
    "routes/app-shell.tsx": { entry: true },
    "routes/stock.tsx": { entry: true },
    "routes/insight.tsx": { entry: true },
    "components/route-error.tsx": { importers: ["root.tsx"] },
    "lib/format.ts": {
      importers: [
        "routes/app-shell.tsx",
        "routes/stock.tsx",
        "components/lazy-view.tsx",
      ],
    },
    "lib/roles.ts": { importers: ["lib/navigation.ts"] },
    "lib/navigation.ts": { importers: ["routes/app-shell.tsx"] },
    "lib/unit-text.ts": {
      importers: ["routes/stock.tsx", "routes/insight.tsx"],
    },
    "lib/password.ts": {
      importers: ["routes/sign-in.tsx", "routes/app-shell.tsx"],
    },
    "components/lazy-view.tsx": {
      importers: ["routes/stock.tsx"],
      lazyImporters: ["routes/stock.tsx"],
    },
    "components/table-scroll.tsx": { importers: ["components/lazy-view.tsx"] },
  });
  const name = (module: string) => chunkOf(file(module), modules);

  it("gathers what only root or only a layout loads beside it, through any depth", () => {
    expect(name("components/route-error.tsx")).toBe("root-modules");
    expect(name("lib/navigation.ts")).toBe("app-shell-modules");
    expect(name("lib/roles.ts")).toBe("app-shell-modules");
    // Pages inside the shell load it anyway, and so does a lazy chunk of theirs.
    expect(name("lib/format.ts")).toBe("app-shell-modules");
  });

  it("leaves to the bundler what some pages of a layout load, or pages on both sides of it", () => {
    expect(name("lib/unit-text.ts")).toBeNull();
    expect(name("lib/password.ts")).toBeNull();
  });

  it("leaves route modules, lazily loaded modules and what only they reach to the bundler", () => {
    expect(name("routes/app-shell.tsx")).toBeNull();
    expect(name("components/lazy-view.tsx")).toBeNull();
    expect(name("components/table-scroll.tsx")).toBeNull();
    expect(
      chunkOf(path.resolve("node_modules/react/index.js"), modules),
    ).toBeNull();
  });
});
