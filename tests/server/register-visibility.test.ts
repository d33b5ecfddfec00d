import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@shared/schemas/auth.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signedInBellbird, type DemoIds } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface Line {
  id: string;
  technician: { id: string; name: string } | null;
}

/**
 * Issue 13, item 3: GET /api/register showed a technician only their own lines, but a visit's
 * refrigerant, a unit's history and a cylinder's movements showed every technician's lines and
 * names to technicians and apprentices. One rule now decides for all of them
 * (server/register/register-visibility.ts): owners and seniors read every line, technicians
 * their own, apprentices none; balances, leak rates and contents still count every line.
 */
describe("who reads which register line", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  let agents: Record<Role | "technician2", Agent>;
  let visitId: string;
  let unitId: string;
  let recoveryId: string;
  /** Line ids by who recorded them. */
  const linesBy: Record<string, string[]> = {};

  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
    agents = {
      ...(await signedInBellbird(testApp.app)),
      technician2: await signedIn(testApp.app, "tech2@bellbird.example"),
    };

    const unit = (await agents.technician.get("/api/equipment")).body.equipment.find(
      (candidate: { refrigerant: string }) => candidate.refrigerant === "R407C",
    );
    unitId = unit.id;
    visitId = (
      await agents.technician.post("/api/visits").send({ equipmentId: unitId, reason: "Two technicians on one job" })
    ).body.visit.id;
    recoveryId = (
      await agents.technician
        .post("/api/cylinders")
        .send({ label: "VIS-REC-1", kind: "recovery", refrigerant: "R407C", waterCapacityKg: 26, tareKg: 14 })
    ).body.cylinder.id;
    const log = async (who: "technician" | "technician2" | "senior", body: object) => {
      const response = await agents[who].post(`/api/visits/${visitId}/refrigerant`).send(body);
      expect(response.status, JSON.stringify(response.body)).toBe(201);
      (linesBy[who] ??= []).push(response.body.movement.id);
    };
    await log("technician", { kind: "recovered", kg: 2, circuit: 1, cylinderId: recoveryId, note: "Sam's recovery" });
    await log("technician2", {
      kind: "recovered",
      kg: 1.5,
      circuit: 1,
      cylinderId: recoveryId,
      note: "Lee's recovery",
    });
    await log("senior", { kind: "reused", kg: 1, circuit: 1, cylinderId: recoveryId });
  });
  afterAll(() => testApp.close());

  const lineIds = (lines: Line[]) => lines.map((line) => line.id).sort();
  const all = () => [...linesBy.technician!, ...linesBy.technician2!, ...linesBy.senior!].sort();

  describe.each([
    ["visit refrigerant", () => `/api/visits/${visitId}/refrigerant`],
    ["unit history", () => `/api/equipment/${unitId}/refrigerant`],
    ["cylinder movements", () => `/api/cylinders/${recoveryId}`],
  ])("%s", (_what, url) => {
    it.each(["owner", "senior"] as const)("shows the %s every line with its technician", async (role) => {
      const body = (await agents[role].get(url())).body;
      expect(lineIds(body.movements)).toEqual(all());
      expect(body.hiddenMovements).toBe(0);
      expect(JSON.stringify(body.movements)).toContain("Lee Hargreaves");
    });

    it("shows a technician only the lines they recorded, and says how many it leaves out", async () => {
      const body = (await agents.technician.get(url())).body;
      expect(lineIds(body.movements)).toEqual([...linesBy.technician!].sort());
      expect(body.hiddenMovements).toBe(2);
      expect(body.movements.every((line: Line) => line.technician?.id === ids[BELLBIRD.technician])).toBe(true);
      const text = JSON.stringify(body);
      expect(text).not.toContain("Lee Hargreaves");
      expect(text).not.toContain("Lee's recovery");
      expect(text).not.toContain("Priya Raman");
    });

    it("shows an apprentice no line at all", async () => {
      const response = await agents.apprentice.get(url());
      expect(response.status).toBe(200);
      expect(response.body.movements).toEqual([]);
      expect(response.body.hiddenMovements).toBe(3);
      expect(JSON.stringify(response.body)).not.toMatch(/Sam Toko|Lee Hargreaves|Priya Raman/);
    });
  });

  it("still counts every line in the balance, the cylinder's contents and the unit's figures", async () => {
    const forApprentice = (await agents.apprentice.get(`/api/visits/${visitId}/refrigerant`)).body;
    const forOwner = (await agents.owner.get(`/api/visits/${visitId}/refrigerant`)).body;
    expect(forApprentice.circuits).toEqual(forOwner.circuits);
    expect(forApprentice.circuits[0]).toMatchObject({ recoveredKg: 3.5, reusedKg: 1 });
    const cylinder = (await agents.technician.get(`/api/cylinders/${recoveryId}`)).body.cylinder;
    expect(cylinder.contentsKg).toBeCloseTo(2.5, 6);
  });

  it("keeps the register itself as it was: a technician's own lines, 403 for a colleague's or an apprentice", async () => {
    const own = (await agents.technician.get("/api/register")).body;
    expect(lineIds(own.movements)).toEqual([...linesBy.technician!].sort());
    expect(own.allTechnicians).toBe(false);
    expect((await agents.technician.get(`/api/register?technicianId=${ids["tech2@bellbird.example"]}`)).status).toBe(
      403,
    );
    expect((await agents.apprentice.get("/api/register")).status).toBe(403);
    const whole = (await agents.senior.get("/api/register")).body;
    expect(lineIds(whole.movements)).toEqual(all());
    const csv = await agents.technician.get("/api/register/export.csv");
    expect(csv.text).toContain("Sam Toko");
    expect(csv.text).not.toContain("Lee Hargreaves");
  });
});
