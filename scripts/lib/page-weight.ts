/**
 * How much JavaScript each page makes a browser download before it can run:
 * read from the production build's route manifest (assets/manifest-*.js, the
 * one React Router's pages load). A page's first-load JavaScript is the
 * manifest itself, the client entry and its imports, and for the root, each
 * layout around the route and the route: its module and all its static
 * imports (the manifest lists them transitively, as the page's
 * modulepreload links do). Chunks imported dynamically (import()) load later
 * and are not counted. Sizes are gzip at level 9, as the build's .gz copies
 * (server/precompressed-assets.ts). See
 * docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";

/** The budget of every page: first-load JavaScript, gzipped, in KB of 1,024 bytes. */
export const firstLoadBudgetKb = 150;

interface ManifestRoute {
  id: string;
  parentId?: string;
  path?: string;
  index?: boolean;
  hasDefaultExport: boolean;
  module: string;
  imports?: string[];
}

interface RouteManifest {
  entry: { module: string; imports: string[] };
  routes: Record<string, ManifestRoute>;
}

/** One page's first-load JavaScript. */
export interface PageWeight {
  routeId: string;
  /** The route's address pattern, e.g. "/designs/:designId/revisions/:revision". */
  path: string;
  /** Every script the page loads at once, by its address under the client folder. */
  scripts: string[];
  gzipBytes: number;
}

function manifestFile(clientFolder: string): string {
  const names = fs
    .readdirSync(path.join(clientFolder, "assets"))
    .filter((name) => /^manifest-[0-9a-f]+\.js$/.test(name));
  if (names.length !== 1)
    throw new Error(
      `expected one route manifest in ${clientFolder}/assets, found ${names.length}`,
    );
  return `/assets/${names[0]}`;
}

function readManifest(clientFolder: string, address: string): RouteManifest {
  const text = fs.readFileSync(path.join(clientFolder, address), "utf8");
  const json = text
    .replace(/^window\.__reactRouterManifest=/, "")
    .replace(/;\s*$/, "");
  return JSON.parse(json) as RouteManifest;
}

/** The route and the layouts around it, outermost (root) first. */
function branchOf(manifest: RouteManifest, routeId: string): ManifestRoute[] {
  const branch: ManifestRoute[] = [];
  let route: ManifestRoute | undefined = manifest.routes[routeId];
  while (route) {
    branch.unshift(route);
    route = route.parentId ? manifest.routes[route.parentId] : undefined;
  }
  return branch;
}

function pathOf(branch: ManifestRoute[]): string {
  const parts = branch.map((route) => route.path ?? "").filter(Boolean);
  return `/${parts.join("/")}`;
}

/**
 * The first-load JavaScript of every page of the build in `clientFolder`
 * (e.g. "build/client"): each route with a component, heaviest first.
 */
export function pageWeights(clientFolder: string): PageWeight[] {
  const manifestAddress = manifestFile(clientFolder);
  const manifest = readManifest(clientFolder, manifestAddress);
  const gzipped = new Map<string, number>();
  const gzipBytes = (address: string) => {
    let bytes = gzipped.get(address);
    if (bytes === undefined) {
      bytes = zlib.gzipSync(fs.readFileSync(path.join(clientFolder, address)), {
        level: zlib.constants.Z_BEST_COMPRESSION,
      }).length;
      gzipped.set(address, bytes);
    }
    return bytes;
  };
  const pages: PageWeight[] = [];
  for (const route of Object.values(manifest.routes)) {
    // Layouts count within their pages; resource routes (CSV, API) have no page.
    if (!route.hasDefaultExport || route.id === "root") continue;
    if (route.id === "routes/app-shell") continue;
    const branch = branchOf(manifest, route.id);
    const scripts = new Set([
      manifestAddress,
      manifest.entry.module,
      ...manifest.entry.imports,
    ]);
    for (const layer of branch) {
      scripts.add(layer.module);
      for (const address of layer.imports ?? []) scripts.add(address);
    }
    pages.push({
      routeId: route.id,
      path: pathOf(branch),
      scripts: [...scripts],
      gzipBytes: [...scripts].reduce(
        (total, address) => total + gzipBytes(address),
        0,
      ),
    });
  }
  return pages.sort((a, b) => b.gzipBytes - a.gzipBytes);
}

/** KB of 1,024 bytes, one decimal. */
export function kilobytes(bytes: number): number {
  return Math.round((bytes / 1024) * 10) / 10;
}
