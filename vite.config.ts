import { fileURLToPath } from "node:url";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vitest/config";

const fromRoot = (path: string) => fileURLToPath(new URL(path, import.meta.url));

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
  build: { outDir: "dist", sourcemap: false },
  test: {
    include: ["tests/**/*.test.{ts,tsx}"],
    exclude: ["tests/browser/**", "node_modules/**"],
    environment: "node",
    setupFiles: ["tests/setup/load-refrigerant-tables.ts", "tests/setup/setup-test-env.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
