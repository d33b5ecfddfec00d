import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

/**
 * The API's answers are compressed for whichever encoding the client takes (server/app.ts: a
 * cheaper level than the built client's, since every answer pays it), and still decode to the
 * same JSON.
 */
describe("API answers compressed", () => {
  let testApp: TestApp;
  let technician: Awaited<ReturnType<typeof signedIn>>;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
  });
  afterAll(() => testApp.close());

  it.each(["gzip", "br"])(
    "sends a list in %s when the client takes it, and identity when it takes none",
    async (encoding) => {
      const compressed = await technician.get("/api/visits").set("Accept-Encoding", encoding);
      expect(compressed.status).toBe(200);
      expect(compressed.headers["content-encoding"]).toBe(encoding);
      const plain = await technician.get("/api/visits").set("Accept-Encoding", "identity");
      expect(plain.headers["content-encoding"]).toBeUndefined();
      expect(compressed.body).toEqual(plain.body);
      expect(plain.body.visits.length).toBeGreaterThan(0);
    },
  );
});
