import js from "@eslint/js";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";
import { domainLayerConfigs } from "./scripts/lint/domain-layers.js";

export default tseslint.config(
  {
    ignores: [
      "build/",
      "build-*/",
      ".react-router/",
      ".data/",
      "node_modules/",
      "drizzle/",
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ["**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_" },
      ],
      // This project does not use the React Compiler.
      "react-hooks/incompatible-library": "off",
    },
  },
  {
    // Every write transaction runs through writeTransaction, which retries deadlocks,
    // lock wait timeouts and Galera certification conflicts (decision 027).
    files: ["app/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-syntax": [
        "error",
        {
          selector:
            "CallExpression[callee.type='MemberExpression'][callee.object.name='db'][callee.property.name='transaction']",
          message:
            "Run write transactions through writeTransaction (app/db/write-transaction.server.ts): it retries deadlocks and Galera conflicts.",
        },
        {
          selector:
            "CallExpression[callee.type='MemberExpression'][callee.property.name='beginTransaction']",
          message:
            "Begin transactions only inside retryWriteConflicts or writeTransaction (app/db/write-transaction.server.ts).",
        },
        {
          selector:
            "ImportDeclaration[source.value='@conform-to/zod/v4'] ImportSpecifier[imported.name='parseWithZod']",
          message:
            "Read forms with parseForm (app/lib/parse-form.ts): it reads number fields in the person's locale.",
        },
        {
          selector:
            "ImportDeclaration[source.value='@tanstack/react-table'][importKind!='type'] ImportSpecifier[imported.name='createColumnHelper']",
          message:
            "Make columns with createColumnHelper of app/lib/table-columns.ts: the library's would load all of TanStack Table with the page.",
        },
        {
          selector:
            "NewExpression[callee.object.name='Intl'][callee.property.name=/^(DateTimeFormat|NumberFormat)$/]",
          message:
            "Format numbers and times for people through app/lib/format.ts: it follows the person's locale and time zone.",
        },
        {
          selector: "CallExpression[callee.property.name='toLocaleString']",
          message:
            "Format numbers and times for people through app/lib/format.ts: it follows the person's locale and time zone.",
        },
      ],
    },
  },
  {
    // The one place that wraps Conform's parseWithZod, and the one formatter.
    files: [
      "app/lib/parse-form.ts",
      "app/lib/format.ts",
      "app/lib/display-settings.ts",
    ],
    rules: { "no-restricted-syntax": "off" },
  },
  {
    // Log lines go through the one logger (app/observability/logger.server.ts, decision 024).
    files: ["app/**/*.{ts,tsx}", "server/**/*.ts"],
    rules: { "no-console": "error" },
  },
  // A domain folder imports only the folders below it (scripts/lint/domain-layers.js).
  ...domainLayerConfigs(),
  {
    files: ["server.js"],
    languageOptions: {
      globals: {
        process: "readonly",
        console: "readonly",
        setTimeout: "readonly",
      },
    },
  },
);
