import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { VitePWA } from "vite-plugin-pwa";
import type { Plugin } from "vite";
import { defineConfig } from "vitest/config";
import { TABLE_CACHE, TABLE_URL } from "./src/features/offline/table-cache.ts";
import { precompressAssets } from "./scripts/precompress-assets.ts";

const fromRoot = (path: string) => fileURLToPath(new URL(path, import.meta.url));

/**
 * Stable names for the refrigerant tables' chunks (`refrigerant-R32-[hash].js` for a saturation
 * table, `single-phase-R32-[hash].js` for its single-phase table), so that a service worker can
 * list them for offline use by name; ids like "R1234ze(E)" become "R1234ze-E".
 */
const TABLE_FILE = /data[\\/]refrigerants[\\/](single-phase[\\/])?([^\\/]+)\.json$/;
function chunkFileName(chunk: { facadeModuleId: string | null }): string {
  const table = TABLE_FILE.exec(chunk.facadeModuleId ?? "");
  if (!table) return "assets/[name]-[hash].js";
  const id = table[2]!.replace(/[^A-Za-z0-9]+/g, "-").replace(/-$/, "");
  return `assets/${table[1] ? "single-phase" : "refrigerant"}-${id}-[hash].js`;
}

/**
 * React Router's production build. Its package sends every bundler to the development build, which
 * carries the development warnings (remix-run/react-router issues 12532 and 14753); the production
 * build beside it is the same code without them, 0.5 kB brotli less on every first page. Builds
 * only: the development server and the tests keep the warnings.
 */
function reactRouterProductionBuild(): Plugin {
  const builds: Record<string, string> = {
    "react-router": fromRoot("./node_modules/react-router/dist/production/index.mjs"),
    "react-router/dom": fromRoot("./node_modules/react-router/dist/production/dom-export.mjs"),
  };
  return {
    name: "react-router-production-build",
    apply: "build",
    enforce: "pre",
    resolveId: (source) => builds[source] ?? null,
  };
}

/**
 * The tab's icon written into the page as a data URL, from public/satura-mark.svg (the installed
 * app's icon), so the mark has one source: fetched, the icon held one of the six connections a
 * slow link gives the first screen's scripts and data. index.html names the file; the development
 * server and the build both inline it.
 */
function inlineTabIcon(): Plugin {
  const file = fromRoot("./public/satura-mark.svg");
  return {
    name: "inline-tab-icon",
    transformIndexHtml(html) {
      const svg = readFileSync(file, "utf8").trim();
      const dataUrl = `data:image/svg+xml,${encodeURIComponent(svg)}`;
      const link = /<link rel="icon" type="image\/svg\+xml" href="\/satura-mark\.svg" \/>/;
      if (!link.test(html)) throw new Error("index.html no longer names /satura-mark.svg as the tab's icon");
      return html.replace(link, `<link rel="icon" type="image/svg+xml" href="${dataUrl}" />`);
    },
  };
}

/**
 * Fewer, larger chunks. Left to itself the bundler cuts one chunk per set of screens sharing a
 * module, and the run log's first load came to 52 files: on HTTP/1.1 a browser opens six
 * connections to a host, so its data requests queued behind forty scripts. Each group below is
 * one file; higher priority picks first. Modules used by one screen only stay in its chunk.
 */
const REFRIGERANT_TABLE = /data[\\/]refrigerants[\\/]/;
/**
 * The casebook's, the procedures' and the register's contracts, each a chunk group of its own: about
 * 1,600 of the 2,800 zod schemas the client builds, each built when its module first runs (15–25 µs
 * apiece on a desktop, four times that on the throttled phone). In the common chunk every signed-in
 * screen built them all before its first render; apart, they come with the screens that use them.
 * The casebook's takes the scorer, which reads its answer fields and tolerances: in the engine's
 * chunk it made the engine import this one, which imports the engine's case generator.
 */
const FEATURE_CONTRACTS: Record<string, RegExp> = {
  "casebook-contracts": /(schemas|api)[\\/]casebook\.ts$|engine[\\/]casebook[\\/]score-attempt\.ts$/,
  "procedure-contracts": /schemas[\\/]procedure(s|-records)\.ts$|api[\\/](procedures|organisation)\.ts$/,
  "register-contracts": /(schemas|api)[\\/]register\.ts$/,
};
const isFeatureContract = (id: string) => Object.values(FEATURE_CONTRACTS).some((test) => test.test(id));
const chunkGroups = [
  // Everything the first page needs, whichever it is, in one file beside the entry.
  { name: "start", tags: ["$initial" as const], priority: 50 },
  // react-hook-form and the app's helpers around it (use-form-values.ts with them: in the common
  // chunk it put the forms on every signed-in screen's first load, the run log's included).
  {
    name: "forms",
    test: /node_modules[\\/]react-hook-form[\\/]|src[\\/](lib[\\/](form-errors|lazy-zod-resolver)|hooks[\\/]use-form-values)\./,
    priority: 40,
  },
  // The reason dialog (void a record, clear a reference point) is a react-hook-form form: in the
  // common chunk it put the forms on every signed-in screen's first load; in the forms chunk it
  // would bring the common chunk to the sign-in page. Loaded by the panels that void, which the
  // run log loads once its first screen is drawn.
  {
    name: "reason-dialog",
    test: /src[\\/](components[\\/]ui[\\/](reason-dialog|void-record)[\\/]|features[\\/]visit[\\/]components[\\/]visit-void-action\.)/,
    priority: 20,
  },
  // Apart from react-hook-form: the public screens' forms load it on their first check
  // (lazy-zod-resolver.ts), so the sign-in page never fetches it.
  {
    name: "zod-resolver",
    test: /node_modules[\\/]@hookform[\\/]resolvers[\\/]/,
    priority: 40,
  },
  // What the public forms draw with, apart from the app's other components.
  {
    name: "ui-basics",
    test: /src[\\/]components[\\/]ui[\\/](button|field)[\\/]/,
    priority: 35,
    includeDependenciesRecursively: true,
  },
  // The saturation tables' import list, alone: a visit's first screen reads it as soon as the
  // visit names its refrigerant (first-requests.ts), before the engine's and the common chunk
  // have arrived, and no other first screen needs it.
  {
    name: "table-imports",
    test: /saturation-table-imports|prefetch-refrigerant-table/,
    priority: 30,
  },
  // What a visit's run log shares with its other sections and its report (the finding, the
  // measured cycle, the outbox's waiting entries): one file, not five, three of them under 1 kB.
  // Voiding and the procedures' frame are not on the run log's first screen and stay out. On
  // HTTP/1.1 the browser sends six requests at a time, and the unit and its refrigerant's table,
  // asked for as the visit answers, waited behind them.
  {
    name: "visit-parts",
    test: /src[\\/]features[\\/](run-log[\\/]|offline[\\/]waiting-entries)/,
    minShareCount: 2,
    priority: 15,
  },
  ...Object.entries(FEATURE_CONTRACTS).map(([name, test]) => ({ name, test, priority: 25 })),
  {
    name: "data-table",
    test: /node_modules[\\/](@tanstack[\\/](react-table|table-core|store|react-store)|use-sync-external-store)[\\/]|src[\\/]components[\\/]ui[\\/]data-table[\\/]/,
    priority: 30,
  },
  // The engine without its tables (each refrigerant's table stays a chunk of its own, their
  // import list one of its own above) and without the three small modules the API schemas read,
  // which would pull it into every screen; with the display units, which convert with the engine.
  // The casebook's contract, which reads the case generator, is in its own group above.
  {
    name: "engine",
    test: (id: string) =>
      /shared[\\/](engine|property-tables)[\\/]|src[\\/]lib[\\/]units[\\/]|node_modules[\\/](psychrolib|convert-units|lodash\.)/.test(
        id,
      ) &&
      !REFRIGERANT_TABLE.test(id) &&
      !/refrigerant-catalogue|property-tolerances|procedure-limits/.test(id),
    priority: 20,
  },
  // The signed-in screens' common code: zod and the API contracts, the API layer, components, icons.
  // The route loaders' module comes with it (one request fewer when a screen opens), and so does
  // the outbox, which the app's frame reads on every signed-in screen, and the read-only note
  // (one sentence, which was a request of its own beside the run log's scripts). Left out, so
  // that this chunk never imports the engine's: the display units (the engine's unit conversions).
  {
    name: "app",
    test: (id: string) =>
      /shared[\\/](schemas|content|format)[\\/]|refrigerant-catalogue|property-tolerances|procedure-limits|src[\\/](lib|components|hooks)[\\/]|src[\\/]features[\\/]offline[\\/](outbox-store|use-outbox)\.|read-only-note\.|node_modules[\\/](zod|lucide-react|class-variance-authority|react-error-boundary|@tanstack[\\/](query-core|react-query))[\\/]/.test(
        id,
      ) &&
      !isFeatureContract(id) &&
      !/src[\\/]lib[\\/]units[\\/]/.test(id),
    minShareCount: 2,
    priority: 10,
  },
];

/**
 * The installable app (decision 027). Workbox precaches the shell: every script, stylesheet,
 * font and the icon, so that the app starts with no network. The refrigerant tables are left
 * out of the precache (31 saturation and 31 single-phase tables, several megabytes that a phone
 * on a roof should not fetch for refrigerants it never meets); they are cached when first loaded
 * and warmed for the refrigerants of the technician's own equipment
 * (src/features/offline/warm-refrigerant-tables.ts). The API is never cached by the service
 * worker: data kept for offline use lives in the app's own store. A navigation under /api/ (a
 * photo, a CSV export) goes to the network, never to the app's page.
 */
const installableApp = VitePWA({
  strategies: "generateSW",
  registerType: "prompt",
  // Registered from the app, on idle, by src/features/offline/service-worker.ts.
  injectRegister: false,
  manifest: {
    name: "Satura",
    short_name: "Satura",
    description:
      "Saturation, superheat, subcooling and the service record for refrigeration and air-conditioning technicians.",
    lang: "en-AU",
    start_url: "/",
    scope: "/",
    display: "standalone",
    background_color: "#f4efe4",
    theme_color: "#f4efe4",
    icons: [{ src: "/satura-mark.svg", sizes: "any", type: "image/svg+xml", purpose: "any" }],
  },
  workbox: {
    globPatterns: ["**/*.{js,css,html,woff2,svg}"],
    // Latin and Latin Extended cover the app's text; the other subsets of the fonts are fetched
    // only if a page shows such a character, and fall back to the system font offline.
    globIgnores: [
      "**/assets/refrigerant-*.js",
      "**/assets/single-phase-*.js",
      "**/assets/*-{cyrillic,cyrillic-ext,greek,vietnamese}-*.woff2",
    ],
    navigateFallback: "/index.html",
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    runtimeCaching: [
      {
        urlPattern: TABLE_URL,
        handler: "CacheFirst",
        options: { cacheName: TABLE_CACHE },
      },
    ],
  },
});

export default defineConfig({
  plugins: [react(), tailwindcss(), reactRouterProductionBuild(), inlineTabIcon(), installableApp, precompressAssets()],
  // convert-units 2.x pulls lodash modules that read `global` (STACK.md gotcha 3).
  // __SATURA_BUILD__: the build's identity, so that data kept on a device (src/features/offline/
  // persist-queries.ts) is read only by the screens that wrote it.
  define: { global: "globalThis", __SATURA_BUILD__: JSON.stringify(Date.now().toString(36)) },
  resolve: {
    alias: {
      "@/": fromRoot("./src/"),
      "@shared/": fromRoot("./shared/"),
      "@server/": fromRoot("./server/"),
    },
  },
  server: { proxy: { "/api": "http://127.0.0.1:3000" } },
  build: {
    outDir: "dist",
    sourcemap: false,
    rolldownOptions: {
      // The engine and the contracts only define functions, constants and schemas: a module of
      // theirs that nothing uses is dropped, even when an index re-exports it. Otherwise the
      // engine's index, which re-exports the casebook's scorer, made every screen that loads the
      // engine build the casebook's schemas (FEATURE_CONTRACTS).
      treeshake: { moduleSideEffects: [{ test: /[\\/]shared[\\/](engine|schemas)[\\/]/, sideEffects: false }] },
      output: {
        chunkFileNames: chunkFileName,
        // Groups take only the modules they name; what those import stays where it belongs.
        codeSplitting: { includeDependenciesRecursively: false, groups: chunkGroups },
      },
    },
  },
  test: {
    include: ["tests/**/*.test.{ts,tsx}"],
    exclude: ["tests/browser/**", "node_modules/**"],
    environment: "node",
    setupFiles: ["tests/setup/load-refrigerant-tables.ts", "tests/setup/setup-test-env.ts"],
    // With TEST_DATABASE_URL: the migrated PostgreSQL template, made once per run.
    globalSetup: ["tests/setup/postgres-template.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
