import { readFileSync } from "node:fs";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { adjustments } from "@server/db/schema.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface CylinderBody {
  id: string;
  label: string;
  kind: string;
  contentsKg: number;
  fill: { maxContentsKg: number | null };
}
interface AdjustmentBody {
  id: string;
  kind: string;
  amountKg: number | null;
  movementId: string | null;
  voided: { reason: string } | null;
}
interface MovementBody {
  id: string;
  kind: string;
  kg: number;
  cylinder: { label: string } | null;
  voided: { reason: string } | null;
}

/**
 * One charge entry, one number: a run-log charge adjustment is its register movement. The
 * register rules checked here are TRADE.md §6: a cylinder holds one refrigerant, a recovery
 * cylinder is never filled past 80 % of its volume with liquid, and the record names the
 * cylinder the refrigerant came from or went into.
 */
describe("charge entries (run log and register as one entry)", () => {
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;
  let supply: CylinderBody;
  let recovery: CylinderBody;

  const cylinder = async (id: string) => (await technician.get(`/api/cylinders/${id}`)).body.cylinder as CylinderBody;
  const runLog = async () =>
    (await technician.get(`/api/visits/${visitId}`)).body.visit.adjustments as AdjustmentBody[];
  const register = async () => (await technician.get(`/api/visits/${visitId}/refrigerant`)).body;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const units = (await technician.get("/api/equipment")).body.equipment as { id: string; refrigerant: string }[];
    const rooftopId = units.find((unit) => unit.refrigerant === "R407C")!.id;
    visitId = (
      await technician.post("/api/visits").send({ equipmentId: rooftopId, reason: "Short of charge on circuit 1" })
    ).body.visit.id;
    const cylinders = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders as CylinderBody[];
    supply = cylinders.find((entry) => entry.kind === "new")!;
    recovery = cylinders.find((entry) => entry.kind === "recovery")!;
  }, 300_000);
  afterAll(() => testApp.close());

  it("records 'refrigerant added 0.45 kg' with its cylinder as one linked register movement", async () => {
    const posted = await technician.post(`/api/visits/${visitId}/adjustments`).send({
      circuit: 1,
      kind: "charge-added",
      description: "Added 0.45 kg liquid at the suction port",
      amountKg: 0.45,
      cylinderId: supply.id,
    });
    expect(posted.status).toBe(201);
    const adjustment = posted.body.adjustment as AdjustmentBody;
    expect(adjustment.movementId).not.toBeNull();
    const body = await register();
    const movement = (body.movements as MovementBody[]).find((entry) => entry.id === adjustment.movementId)!;
    // A new (virgin) cylinder's refrigerant going into the system is "added-new" in the register.
    expect(movement).toMatchObject({ kind: "added-new", kg: 0.45, cylinder: { label: supply.label } });
    expect(body.circuits[0].addedKg).toBeCloseTo(0.45, 9);
    expect((await cylinder(supply.id)).contentsKg).toBeCloseTo(supply.contentsKg - 0.45, 9);
    expect(body.runLogCheck).toMatchObject({
      runLogInKg: 0.45,
      registerInKg: 0.45,
      runLogOutKg: 0,
      registerOutKg: 0,
      agrees: true,
      unlinked: [],
    });
  });

  it("refuses an overfilling recovery and stores neither the adjustment nor the movement", async () => {
    const before = { runLog: (await runLog()).length, register: (await register()).movements.length };
    const fresh = await cylinder(recovery.id);
    expect(fresh.fill.maxContentsKg).not.toBeNull();
    const room = fresh.fill.maxContentsKg! - fresh.contentsKg;
    const refused = await technician.post(`/api/visits/${visitId}/adjustments`).send({
      circuit: 1,
      kind: "charge-removed",
      description: "Recovered the charge",
      amountKg: Number((room + 0.5).toFixed(2)),
      cylinderId: recovery.id,
    });
    expect(refused.status).toBe(400);
    expect(refused.body.fields.kg).toMatch(/past its 80 % limit/);
    expect((await runLog()).length).toBe(before.runLog);
    expect((await register()).movements.length).toBe(before.register);
    expect((await cylinder(recovery.id)).contentsKg).toBeCloseTo(fresh.contentsKg, 9);
  });

  it("refuses a cylinder of another refrigerant and stores neither", async () => {
    const r32 = await technician.post("/api/cylinders").send({
      label: "CE-R32-N1",
      kind: "new",
      refrigerant: "R32",
      waterCapacityKg: 11,
      tareKg: 6,
      initialContentsKg: 9,
    });
    expect(r32.status).toBe(201);
    const before = { runLog: (await runLog()).length, register: (await register()).movements.length };
    const refused = await technician.post(`/api/visits/${visitId}/adjustments`).send({
      circuit: 1,
      kind: "charge-added",
      description: "Topped up",
      amountKg: 0.3,
      cylinderId: r32.body.cylinder.id,
    });
    expect(refused.status).toBe(400);
    expect(refused.body.fields.cylinderId).toMatch(/holds R32, not R407C/);
    expect((await runLog()).length).toBe(before.runLog);
    expect((await register()).movements.length).toBe(before.register);
    expect((await cylinder(r32.body.cylinder.id)).contentsKg).toBe(9);
  });

  it("puts a movement logged on the Refrigerant section on the run log, with the same kilograms", async () => {
    const posted = await technician.post(`/api/visits/${visitId}/refrigerant`).send({
      kind: "recovered",
      kg: 1.2,
      circuit: 1,
      cylinderId: recovery.id,
      note: "Recovered before the valve core",
    });
    expect(posted.status).toBe(201);
    const entry = (await runLog()).find((adjustment) => adjustment.movementId === posted.body.movement.id);
    expect(entry).toMatchObject({ kind: "charge-removed", amountKg: 1.2 });
    // Named again from the run log, the same movement is refused: it is already there.
    const twice = await technician.post(`/api/visits/${visitId}/adjustments`).send({
      circuit: 1,
      kind: "charge-removed",
      description: "Recovered",
      amountKg: 1.2,
      movementId: posted.body.movement.id,
    });
    expect(twice.status).toBe(400);
    expect(twice.body.fields.movementId).toMatch(/already on the run log/);
  });

  it("voids both sides whichever side is voided, and keeps the cylinder's contents right", async () => {
    const added = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ circuit: 1, kind: "charge-added", description: "Added 0.25 kg", amountKg: 0.25, cylinderId: supply.id });
    const before = (await cylinder(supply.id)).contentsKg;
    const voided = await technician
      .post(`/api/visits/${visitId}/voids`)
      .send({ kind: "adjustment", recordId: added.body.adjustment.id, reason: "Weighed on the wrong scale" });
    expect(voided.status).toBe(201);
    const movement = ((await register()).movements as MovementBody[]).find(
      (entry) => entry.id === added.body.adjustment.movementId,
    )!;
    expect(movement.voided?.reason).toBe("Weighed on the wrong scale");
    expect((await cylinder(supply.id)).contentsKg).toBeCloseTo(before + 0.25, 9);

    const logged = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "added-new", kg: 0.1, circuit: 1, cylinderId: supply.id });
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/voids`)
          .send({ kind: "movement", recordId: logged.body.movement.id, reason: "Logged twice" })
      ).status,
    ).toBe(201);
    expect(
      (await runLog()).find((adjustment) => adjustment.movementId === logged.body.movement.id)?.voided?.reason,
    ).toBe("Logged twice");

    const trail = (await technician.get(`/api/visits/${visitId}`)).body.visit.events as {
      action: string;
      recordKind: string | null;
      reason: string | null;
    }[];
    const voids = trail.filter((event) => event.action === "voided").map((event) => [event.recordKind, event.reason]);
    expect(voids).toEqual(
      expect.arrayContaining([
        ["adjustment", "Weighed on the wrong scale"],
        ["movement", "Weighed on the wrong scale"],
        ["movement", "Logged twice"],
        ["adjustment", "Logged twice"],
      ]),
    );
  });

  it("gives the same totals from the run log's adjustments and from the register", async () => {
    const body = await register();
    const standing = (await runLog()).filter((adjustment) => adjustment.voided === null);
    const sum = (kind: string) =>
      standing
        .filter((adjustment) => adjustment.kind === kind)
        .reduce((total, adjustment) => total + (adjustment.amountKg ?? 0), 0);
    const movements = (body.movements as MovementBody[]).filter((movement) => movement.voided === null);
    const into = movements
      .filter((movement) => movement.kind !== "recovered")
      .reduce((total, movement) => total + movement.kg, 0);
    const out = movements
      .filter((movement) => movement.kind === "recovered")
      .reduce((total, movement) => total + movement.kg, 0);
    // 0.45 kg added, 1.2 kg recovered: the refused and voided entries count nowhere.
    expect(sum("charge-added")).toBeCloseTo(into, 9);
    expect(sum("charge-removed")).toBeCloseTo(out, 9);
    expect(into).toBeCloseTo(0.45, 9);
    expect(out).toBeCloseTo(1.2, 9);
    expect(body.runLogCheck).toMatchObject({
      runLogInKg: 0.45,
      registerInKg: 0.45,
      runLogOutKg: 1.2,
      registerOutKg: 1.2,
      agrees: true,
    });
  });

  it("links stored charge adjustments by the migration's rule, and names the ones it cannot link", async () => {
    const db = testApp.database.db;
    // Rows as they were stored before entries were linked: a 1.2 kg "removed" matching the
    // recovery above once its own link is cleared, and a 0.6 kg "added" that matches nothing.
    const [recoveredEntry] = (await runLog()).filter(
      (adjustment) => adjustment.kind === "charge-removed" && adjustment.voided === null,
    );
    await db.execute(sql`update ${adjustments} set movement_id = null where id = ${recoveredEntry!.id}`);
    const [orphan] = await db
      .insert(adjustments)
      .values({
        organisationId: (
          await db.execute<{ organisation_id: string }>(sql`select organisation_id from visits where id = ${visitId}`)
        ).rows[0]!.organisation_id,
        visitId,
        circuit: 1,
        kind: "charge-added",
        description: "Added 0.6 kg",
        amountKg: 0.6,
      })
      .returning({ id: adjustments.id });
    expect((await register()).runLogCheck.unlinked.map((entry: { id: string }) => entry.id).sort()).toEqual(
      [recoveredEntry!.id, orphan!.id].sort(),
    );

    // The migration's last statement is the backfill; run it again on these rows.
    const migration = readFileSync(
      new URL("../../drizzle/0013_charge_adjustment_movement.sql", import.meta.url),
      "utf8",
    );
    const backfill = migration.split("--> statement-breakpoint").at(-1)!;
    await db.execute(sql.raw(backfill));

    const after = await register();
    expect(after.runLogCheck.unlinked).toEqual([
      expect.objectContaining({ id: orphan!.id, amountKg: 0.6, kind: "charge-added" }),
    ]);
    expect((await runLog()).find((adjustment) => adjustment.id === recoveredEntry!.id)?.movementId).toBe(
      recoveredEntry!.movementId,
    );
    // The unlinked 0.6 kg is named, never counted: the totals stay the register's.
    expect(after.runLogCheck).toMatchObject({ runLogInKg: 0.45, registerInKg: 0.45, agrees: true });
  });
});
