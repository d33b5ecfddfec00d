import { fileURLToPath } from "node:url";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vitest/config";

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

export default defineConfig({
  plugins: [react(), tailwindcss()],
  // convert-units 2.x pulls lodash modules that read `global` (STACK.md gotcha 3).
  define: { global: "globalThis" },
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
    rolldownOptions: { output: { chunkFileNames: chunkFileName } },
  },
  test: {
    include: ["tests/**/*.test.{ts,tsx}"],
    exclude: ["tests/browser/**", "node_modules/**"],
    environment: "node",
    setupFiles: ["tests/setup/load-refrigerant-tables.ts", "tests/setup/setup-test-env.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
