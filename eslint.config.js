import js from "@eslint/js";
import tanstackQuery from "@tanstack/eslint-plugin-query";
import checkFile from "eslint-plugin-check-file";
import { importX } from "eslint-plugin-import-x";
import reactHooks from "eslint-plugin-react-hooks";
import { createTypeScriptImportResolver } from "eslint-import-resolver-typescript";
import globals from "globals";
import tseslint from "typescript-eslint";

/**
 * A promise nobody awaits loses its error and its ordering (decision 042): awaited, or `void` on
 * purpose. JSX attributes may take a promise-returning handler: `onSubmit={form.handleSubmit(save)}`
 * is react-hook-form's documented pattern, and handleSubmit returns a promise that React ignores;
 * each submit handler catches its errors (or leaves them in the mutation's state) and shows them in
 * the form, so wrapping every form in `(event) => void …` would say nothing more. The exemption
 * covers every JSX attribute, a component's own callback props too; outside JSX (a mutation's
 * `onSuccess`, a bare call) promises are still checked.
 */
const promiseRules = {
  "@typescript-eslint/no-floating-promises": "error",
  "@typescript-eslint/no-misused-promises": ["error", { checksVoidReturn: { attributes: false } }],
};

export default tseslint.config(
  {
    ignores: [
      ".scratch/**",
      "dist/**",
      "node_modules/**",
      "coverage/**",
      "data/**",
      "drizzle/**",
      "test-results/**",
      "playwright-report/**",
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ["**/*.{ts,tsx,js,mjs}"],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { "check-file": checkFile, "import-x": importX },
    // Resolve the tsconfig aliases (@/, @shared/, @server/) so boundary zones see through them.
    settings: { "import-x/resolver-next": [createTypeScriptImportResolver({ project: "./tsconfig.json" })] },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      // File and folder names are kebab-case everywhere (STYLE.md, Naming).
      "check-file/filename-naming-convention": [
        "error",
        { "**/*.{ts,tsx}": "KEBAB_CASE" },
        { ignoreMiddleExtensions: true },
      ],
      "check-file/folder-naming-convention": ["error", { "{src,server,shared,tests,scripts,bench}/**/": "KEBAB_CASE" }],
      // Import boundaries of the design card: shared/ is pure; the client never reaches into the server.
      "import-x/no-restricted-paths": [
        "error",
        {
          zones: [
            { target: "./shared", from: "./src", message: "shared/ must not import the client" },
            { target: "./shared", from: "./server", message: "shared/ must not import the server" },
            { target: "./src", from: "./server", message: "the client must not import the server" },
            { target: "./server", from: "./src", message: "the server must not import the client" },
          ],
        },
      ],
    },
  },
  {
    // convert-units is imported by one module; everything else calls its convertMeasure (decision 043).
    files: ["**/*.{ts,tsx,js,mjs}"],
    ignores: ["shared/engine/units/convert-measure.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          paths: [{ name: "convert-units", message: "Call convertMeasure (shared/engine/units/convert-measure.ts)." }],
        },
      ],
    },
  },
  {
    // Type-aware rules for the Node side and the shared code. One program, the Node project's: it
    // holds all these files (shared/ then reads with that project's flags), and took less time and
    // memory than projectService.
    files: ["{server,shared,scripts,bench}/**/*.ts", "*.ts"],
    languageOptions: { parserOptions: { project: "./tsconfig.node.json", tsconfigRootDir: import.meta.dirname } },
    rules: promiseRules,
  },
  {
    // The client, under its own project (DOM types, its path aliases).
    files: ["src/**/*.{ts,tsx}"],
    languageOptions: { parserOptions: { project: "./tsconfig.app.json", tsconfigRootDir: import.meta.dirname } },
    rules: promiseRules,
  },
  {
    // The tests, under theirs: a test that leaves a promise running passes before it has checked.
    files: ["tests/**/*.{ts,tsx}"],
    languageOptions: { parserOptions: { project: "./tsconfig.test.json", tsconfigRootDir: import.meta.dirname } },
    rules: promiseRules,
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks, "@tanstack/query": tanstackQuery },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...tanstackQuery.configs.recommended.rules,
    },
  },
);
