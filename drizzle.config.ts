import { defineConfig } from "drizzle-kit";

// Generates SQL migrations from server/db/schema.ts into drizzle/ (`npm run db:generate`).
// `npm run db:migrate` applies them to the development data folder; stop the server first,
// because PGlite has no cross-process lock (STACK.md gotcha 6). With DATABASE_URL it applies
// them to that PostgreSQL instead, without the server's advisory lock: the server migrates
// itself at start-up under the lock, so this is for a database no server is starting on.
const common = { dialect: "postgresql", schema: "./server/db/schema.ts", out: "./drizzle" } as const;
export default defineConfig(
  process.env.DATABASE_URL
    ? { ...common, dbCredentials: { url: process.env.DATABASE_URL } }
    : { ...common, driver: "pglite", dbCredentials: { url: process.env.DATA_DIR ?? "data/db" } },
);
