/**
 * Which domain folder of app/ may import which (DEVELOPERS.md "Domain folders", decision
 * 030). The folders are listed lowest first: a folder may import the folders of its own
 * row and of the rows before it, never those after it. ESLint turns this into an
 * `@typescript-eslint/no-restricted-imports` rule per folder (eslint.config.js), and
 * scripts/lint/domain-layers.test.ts shows that it fires.
 */

/** Lowest first. One row may hold several folders that import each other. */
export const domainLayers = [
  ["lib"],
  ["engineering"],
  ["db", "observability", "mail", "operations"],
  ["auth"],
  ["people"],
  ["reference"],
  ["stock"],
  ["price-lists"],
  ["pricing"],
  ["purchasing"],
  ["purchase-orders"],
  ["alerts"],
  ["designs"],
  ["insight"],
  ["build-orders"],
  ["lots"],
  ["buying-plan"],
  ["stocktakes"],
  ["labels"],
  // The API's contract describes every domain's schemas; the typed client reads only its types.
  ["api-contract", "api-client"],
  ["components"],
  ["routes"],
];

/**
 * Modules that import above their folder today, each with its reason. The list only
 * shrinks: a new module that needs a higher folder moves up (or the code it needs moves
 * down) instead of joining it.
 */
export const knownExceptions = [
  {
    file: "app/lib/flash-messages.ts",
    imports: ["db", "stock"],
    why: "the success texts quote movement types and stock quantities",
  },
  {
    file: "app/lib/request-body-limits.ts",
    imports: ["price-lists"],
    why: "the price-list upload's size limit is the price-list reader's",
  },
  {
    file: "app/observability/metrics.server.ts",
    imports: ["alerts"],
    why: "the open low-stock alerts gauge",
  },
  {
    file: "app/stock/movement-request.ts",
    imports: ["build-orders"],
    why: "the movement API's body names build orders (buildOrderId, BO- references)",
  },
  {
    file: "app/designs/design-costing.server.ts",
    imports: ["insight"],
    why: "design costing answers the insight page's what-if",
  },
  {
    file: "app/components/flash-message.tsx",
    imports: ["routes"],
    why: "the type of the app shell's loader data",
  },
];

/**
 * Files outside the layering: tests (a test may reach anywhere to check across
 * folders) and app/lib's `*.server.ts` request plumbing (flash cookies, API answers),
 * which routes use and which sits with them.
 */
const unlayered = [
  "**/*.test.ts",
  "**/*.test-support.ts",
  "app/lib/**/*.server.ts",
];

function restriction(folders, folder) {
  if (folders.length === 0) return "off";
  return [
    "error",
    {
      patterns: [
        {
          group: folders.map((above) => `~/${above}/**`),
          message: `app/${folder} sits below these folders and may not import them (DEVELOPERS.md "Domain folders", decision 030).`,
        },
      ],
    },
  ];
}

/** The flat-config blocks: one per folder, then one per known exception. */
export function domainLayerConfigs() {
  const aboveOf = new Map();
  domainLayers.forEach((row, index) => {
    const above = domainLayers.slice(index + 1).flat();
    for (const folder of row) aboveOf.set(folder, above);
  });
  const configs = [];
  for (const [folder, above] of aboveOf) {
    if (above.length === 0) continue;
    configs.push({
      files: [`app/${folder}/**/*.{ts,tsx}`],
      ignores: unlayered,
      rules: {
        "@typescript-eslint/no-restricted-imports": restriction(above, folder),
      },
    });
  }
  for (const exception of knownExceptions) {
    const folder = exception.file.split("/")[1];
    const above = aboveOf
      .get(folder)
      .filter((name) => !exception.imports.includes(name));
    configs.push({
      files: [exception.file],
      rules: {
        "@typescript-eslint/no-restricted-imports": restriction(above, folder),
      },
    });
  }
  return configs;
}
