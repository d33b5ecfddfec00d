import { defineConfig } from "drizzle-kit";

// Generates SQL migrations from server/db/schema.ts into drizzle/ (`npm run db:generate`).
// `npm run db:migrate` applies them to the development data folder; stop the server first,
// because PGlite has no cross-process lock (STACK.md gotcha 6).
export default defineConfig({
  dialect: "postgresql",
  driver: "pglite",
  schema: "./server/db/schema.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATA_DIR ?? "data/db" },
});
