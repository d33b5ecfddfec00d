import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { bellbirdAndOutsider, BELLBIRD, signedIn } from "../setup/demo-accounts.ts";
import { demoUnitIds, openVisit } from "../setup/demo-units.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

interface CylinderBody {
  id: string;
  label: string;
  kind: string;
  contentsKg: number;
  grossKg: number;
  fill: { maxContentsKg: number | null; check: { verdict: string; reason: string } | null };
}

/**
 * Parses RFC 4180 CSV (quoted fields, doubled quotes, CRLF) so the export is read the way a
 * spreadsheet reads it, not by splitting on commas.
 */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  for (let index = 0; index < text.length; index++) {
    const char = text[index]!;
    if (quoted) {
      if (char === '"' && text[index + 1] === '"') {
        field += '"';
        index++;
      } else if (char === '"') quoted = false;
      else field += char;
    } else if (char === '"') quoted = true;
    else if (char === ",") {
      row.push(field);
      field = "";
    } else if (char === "\r" && text[index + 1] === "\n") {
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
      index++;
    } else field += char;
  }
  return rows;
}

describe("refrigerant register API", () => {
  let testApp: TestApp;
  let owner: Agent;
  let senior: Agent;
  let technician: Agent;
  let apprentice: Agent;
  let outsider: Agent;
  let people: Record<string, string>;
  let rooftopId: string;
  let splitId: string;
  let visitId: string;
  let recovery: CylinderBody;
  let fresh: CylinderBody;

  beforeAll(async () => {
    testApp = await createTestApp();
    ({ ids: people, owner, senior, technician, apprentice, outsider } = await bellbirdAndOutsider(testApp));
    ({ rooftop: rooftopId, split: splitId } = await demoUnitIds(technician));
    visitId = await openVisit(technician, rooftopId, "Compressor change on circuit 1");
  });
  afterAll(() => testApp.close());

  it("lists the demo cylinders with contents, gross weight and the 80 % limit", async () => {
    const response = await technician.get("/api/cylinders?refrigerant=R407C");
    expect(response.status).toBe(200);
    const list = response.body.cylinders as CylinderBody[];
    expect(list.map((cylinder) => cylinder.label).sort()).toEqual(["BM-407C-N3", "BM-REC-07"]);
    recovery = list.find((cylinder) => cylinder.kind === "recovery")!;
    fresh = list.find((cylinder) => cylinder.kind === "new")!;
    expect(recovery.contentsKg).toBe(5.2);
    // Gross weight = tare + contents (TRADE.md §6 cylinder checks, common practice): 7.4 + 5.2.
    expect(recovery.grossKg).toBeCloseTo(12.6, 6);
    // TRADE.md §6 [S79]: limit = 0.8 × water capacity (L) × liquid density at 54 °C. R407C
    // saturated liquid near 54 °C is about 0.99 kg/L (memory), so 0.8 × 12 × 0.99 ≈ 9.5 kg.
    expect(recovery.fill.maxContentsKg).toBeCloseTo(9.5, 1);
    expect(recovery.fill.check?.verdict).toBe("pass");
    // The 80 % rule is stated for recovery cylinders (TRADE.md §6): a supplier's fill is not judged.
    expect(fresh.fill.check).toBeNull();
  });

  it("creates a cylinder with field messages, refuses a duplicate label, and apprentices may not", async () => {
    const bad = await technician
      .post("/api/cylinders")
      .send({ label: "", kind: "recovery", refrigerant: "R999", waterCapacityKg: -1, tareKg: 5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(["label", "refrigerant", "waterCapacityKg"]));
    const created = await technician.post("/api/cylinders").send({
      label: 'BM "Blue", 2',
      kind: "recovery",
      refrigerant: "R407C",
      waterCapacityKg: 12,
      tareKg: 7.2,
      initialContentsKg: 0,
    });
    expect(created.status).toBe(201);
    expect(created.body.cylinder).toMatchObject({ contentsKg: 0, kind: "recovery" });
    const duplicate = await technician
      .post("/api/cylinders")
      .send({ label: 'bm "blue", 2', kind: "new", refrigerant: "R407C", waterCapacityKg: 12, tareKg: 7.2 });
    expect(duplicate.status).toBe(400);
    expect(duplicate.body.fields.label).toMatch(/already has/);
    expect(
      (
        await apprentice
          .post("/api/cylinders")
          .send({ label: "X", kind: "new", refrigerant: "R32", waterCapacityKg: 10, tareKg: 5 })
      ).status,
    ).toBe(403);
  });

  it("validates movements: kind, mass, circuit and a cylinder where the record needs one", async () => {
    const noCylinder = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 1 });
    expect(noCylinder.status).toBe(400);
    expect(noCylinder.body.fields.cylinderId).toMatch(/cylinder/);
    const bad = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "vented", kg: -2, circuit: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(["kind", "kg", "circuit"]));
    const circuit = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 3, cylinderId: recovery.id });
    expect(circuit.status).toBe(400);
    expect(circuit.body.fields.circuit).toMatch(/2 circuit/);
    const wrongKind = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId: fresh.id });
    expect(wrongKind.status).toBe(400);
    expect(wrongKind.body.fields.cylinderId).toMatch(/recovery cylinder/);
    const nothingToReuse = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "reused", kg: 1, circuit: 1, cylinderId: recovery.id });
    expect(nothingToReuse.status).toBe(400);
    expect(nothingToReuse.body.fields.kg).toMatch(/Nothing has been recovered/);
    expect(
      (
        await apprentice
          .post(`/api/visits/${visitId}/refrigerant`)
          .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId: recovery.id })
      ).status,
    ).toBe(403);
  });

  it("refuses a recovery into a cylinder of another refrigerant with a clear 400", async () => {
    const r32 = await technician
      .post("/api/cylinders")
      .send({ label: "BM-REC-R32", kind: "recovery", refrigerant: "R32", waterCapacityKg: 12, tareKg: 7 });
    const response = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId: r32.body.cylinder.id });
    expect(response.status).toBe(400);
    // One refrigerant per recovery cylinder (TRADE.md §6, common practice; never mix).
    expect(response.body.fields.cylinderId).toMatch(/holds R32, not R407C/);
    expect((await technician.get(`/api/cylinders/${r32.body.cylinder.id}`)).body.cylinder.contentsKg).toBe(0);
  });

  it("warns before a recovery cylinder passes 80 % and refuses a recovery that would pass it", async () => {
    // 5.2 kg + 3.6 kg = 8.8 kg ≈ 93 % of ≈ 9.5 kg: above the 90 %-of-limit warning (engine's margin), below the limit.
    const recovered = await technician.post(`/api/visits/${visitId}/refrigerant`).send({
      kind: "recovered",
      kg: 3.6,
      circuit: 1,
      cylinderId: recovery.id,
      note: "Recovered for the compressor change",
    });
    expect(recovered.status).toBe(201);
    expect(recovered.body.movement).toMatchObject({
      kind: "recovered",
      kg: 3.6,
      refrigerant: "R407C",
      circuit: 1,
      technician: { name: "Sam Toko" },
    });
    expect(recovered.body.cylinder.contentsKg).toBeCloseTo(8.8, 6);
    expect(recovered.body.cylinder.fill.check.verdict).toBe("warn");
    // A further 1 kg would make 9.8 kg, past the limit: refused, with the room left named.
    const over = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 2, cylinderId: recovery.id });
    expect(over.status).toBe(400);
    expect(over.body.fields.kg).toMatch(/past its 80 % limit/);
    expect((await technician.get(`/api/cylinders/${recovery.id}`)).body.cylinder.contentsKg).toBeCloseTo(8.8, 6);
  });

  it("works out the visit's balance against the nameplate and the weigh-in check", async () => {
    const before = await technician.get(`/api/visits/${visitId}/refrigerant`);
    expect(before.status).toBe(200);
    const circuit1 = before.body.circuits[0];
    // Nameplate 4.2 kg, 3.6 kg recovered: the circuit was 0.6 kg short (shortfall = nameplate − recovered).
    expect(circuit1).toMatchObject({ circuit: 1, nameplateKg: 4.2, recoveredKg: 3.6, recoveredOnVisit: true });
    expect(circuit1.balance.shortfallKg).toBeCloseTo(0.6, 6);
    // R407C glides about 5–7 K (TRADE.md §6, §7 glide values from memory): charge as liquid.
    expect(before.body.liquidChargingNote).toMatch(/as liquid/);
    expect(before.body.glideK).toBeGreaterThan(4);

    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/refrigerant`)
          .send({ kind: "reused", kg: 3.6, circuit: 1, cylinderId: recovery.id })
      ).status,
    ).toBe(201);
    const tooMuch = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "added-new", kg: 11, circuit: 1, cylinderId: fresh.id });
    expect(tooMuch.status).toBe(400);
    expect(tooMuch.body.fields.kg).toMatch(/holds only 10 kg/);
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/refrigerant`)
          .send({ kind: "added-new", kg: 0.6, circuit: 1, cylinderId: fresh.id })
      ).status,
    ).toBe(201);

    const after = (await technician.get(`/api/visits/${visitId}/refrigerant`)).body;
    const balanced = after.circuits[0];
    // Final charge = reused + added = 3.6 + 0.6 = 4.2 kg = nameplate.
    expect(balanced.balance.finalChargeKg).toBeCloseTo(4.2, 6);
    expect(balanced.balance.differenceFromNameplateKg).toBeCloseTo(0, 6);
    // Emptied and recharged: weigh-in judged; 4.2 kg against 4.2 kg is within the ±28 g scale accuracy [S11].
    expect(balanced.charging.check.verdict).toBe("pass");
    expect(after.circuits[1].charging).toBeNull();

    // A line-length allowance of +0.5 kg (TRADE.md §6: add per metre of extra liquid line) makes
    // 4.2 kg weighed in 0.5 kg short of 4.7 kg: 10.6 % under, beyond the engine's 10 % warning band.
    const declared = await technician
      .put(`/api/visits/${visitId}/refrigerant/charging/1`)
      .send({ lineAdjustmentKg: 0.5 });
    expect(declared.status).toBe(200);
    expect(declared.body.circuits[0].charging).toMatchObject({ lineAdjustmentKg: 0.5, declared: true });
    expect(declared.body.circuits[0].charging.check.verdict).toBe("fail");
    expect(
      (await technician.put(`/api/visits/${visitId}/refrigerant/charging/1`).send({ lineAdjustmentKg: "lots" })).status,
    ).toBe(400);
    // Changing the figure keeps the earlier declaration, voided with what changed.
    const changed = await technician
      .put(`/api/visits/${visitId}/refrigerant/charging/1`)
      .send({ lineAdjustmentKg: 0.4 });
    expect(changed.body.circuits[0].charging).toMatchObject({ lineAdjustmentKg: 0.4, declared: true });
    const trail = (await technician.get(`/api/visits/${visitId}`)).body.visit.events;
    expect(trail.at(-1)).toMatchObject({
      action: "voided",
      recordKind: "charging",
      reason: "Replaced: line adjustment 0.5 kg changed to 0.4 kg",
    });
    // Withdrawing a declaration is a void with a reason; nothing is deleted (no DELETE route).
    const withdrawn = await technician.post(`/api/visits/${visitId}/voids`).send({
      kind: "charging",
      recordId: changed.body.circuits[0].charging.declarationId,
      reason: "Not a full weigh-in after all",
    });
    expect(withdrawn.status).toBe(201);
    expect((await technician.get(`/api/visits/${visitId}/refrigerant`)).body.circuits[0].charging.declared).toBe(false);
    expect((await technician.delete(`/api/visits/${visitId}/refrigerant/charging/1`)).status).toBe(404);

    // Cylinder contents follow the register: 8.8 − 3.6 reused = 5.2 kg; 10 − 0.6 = 9.4 kg.
    expect((await technician.get(`/api/cylinders/${recovery.id}`)).body.cylinder.contentsKg).toBeCloseTo(5.2, 6);
    const freshDetail = (await technician.get(`/api/cylinders/${fresh.id}`)).body;
    expect(freshDetail.cylinder.contentsKg).toBeCloseTo(9.4, 6);
    expect(freshDetail.movements).toHaveLength(1);
  });

  it("shows each register movement once on the run log, with the same figure (nothing counted twice)", async () => {
    const body = (await technician.get(`/api/visits/${visitId}/refrigerant`)).body;
    const adjustments = (await technician.get(`/api/visits/${visitId}`)).body.visit.adjustments as {
      movementId: string | null;
      amountKg: number;
    }[];
    expect(adjustments).toHaveLength(body.movements.length);
    for (const movement of body.movements as { id: string; kg: number }[]) {
      expect(adjustments.find((adjustment) => adjustment.movementId === movement.id)?.amountKg).toBe(movement.kg);
    }
    expect(body.runLogCheck).toMatchObject({
      runLogInKg: body.runLogCheck.registerInKg,
      runLogOutKg: body.runLogCheck.registerOutKg,
      agrees: true,
      unlinked: [],
    });
    expect(body.circuits[0].addedKg).toBeCloseTo(0.6, 6);
    expect(body.movements).toHaveLength(3);
  });

  it("estimates the equipment's leak rate from its top-ups", async () => {
    // Two plain top-ups on the wall split (0.85 kg nameplate), 182 days apart: the first opens
    // the period, the second's 0.2 kg counts: 0.2 × 365 / 182 ≈ 0.401 kg/yr ≈ 47.2 % of the charge
    // (the annualizing idea of US 40 CFR 82.152, TRADE.md §8.3 leak-rate triggers).
    const r32 = (await technician.get("/api/cylinders?refrigerant=R32")).body.cylinders;
    expect(r32).toHaveLength(1);
    const supply = await technician.post("/api/cylinders").send({
      label: "BM-R32-N1",
      kind: "new",
      refrigerant: "R32",
      waterCapacityKg: 11,
      tareKg: 6,
      initialContentsKg: 9,
    });
    const first = (await technician.post("/api/visits").send({ equipmentId: splitId, reason: "Warm server cupboard" }))
      .body.visit.id;
    const second = (await technician.post("/api/visits").send({ equipmentId: splitId, reason: "Warm again" })).body
      .visit.id;
    expect(
      (
        await technician.post(`/api/visits/${first}/refrigerant`).send({
          kind: "added-new",
          kg: 0.15,
          circuit: 1,
          cylinderId: supply.body.cylinder.id,
          at: "2026-01-10T01:00:00Z",
        })
      ).status,
    ).toBe(201);
    const single = (await technician.get(`/api/equipment/${splitId}/refrigerant`)).body;
    expect(single.topUps).toHaveLength(1);
    expect(single.leakRate).toBeNull();
    expect(
      (
        await technician.post(`/api/visits/${second}/refrigerant`).send({
          kind: "added-new",
          kg: 0.2,
          circuit: 1,
          cylinderId: supply.body.cylinder.id,
          at: "2026-07-11T01:00:00Z",
        })
      ).status,
    ).toBe(201);
    const history = (await technician.get(`/api/equipment/${splitId}/refrigerant`)).body;
    expect(history.nameplateKg).toBe(0.85);
    expect(history.movements).toHaveLength(2);
    expect(history.leakRate.periodDays).toBeCloseTo(182, 6);
    expect(history.leakRate.kgPerYear).toBeCloseTo((0.2 * 365) / 182, 6);
    expect(history.leakRate.percentOfChargePerYear).toBeCloseTo(47.2, 1);

    // The rooftop visit recovered 3.6 kg and put back 4.2 kg: only the 0.6 kg shortfall counts as leaked.
    const rooftop = (await technician.get(`/api/equipment/${rooftopId}/refrigerant`)).body;
    expect(rooftop.topUps).toHaveLength(1);
    expect(rooftop.topUps[0].addedKg).toBeCloseTo(0.6, 6);
  });

  it("exports the register as CSV with proper quoting, filtered by period and technician", async () => {
    // A senior's movement with text a spreadsheet would otherwise misread.
    const other = (await senior.post("/api/visits").send({ equipmentId: rooftopId, reason: "Second opinion" })).body
      .visit.id;
    const quoted = await technician.get("/api/cylinders?refrigerant=R407C");
    const blue = (quoted.body.cylinders as CylinderBody[]).find((cylinder) => cylinder.label.startsWith('BM "Blue"'))!;
    const note = '=SUM(A1) "drained", then\nweighed';
    expect(
      (
        await senior
          .post(`/api/visits/${other}/refrigerant`)
          .send({ kind: "recovered", kg: 0.25, circuit: 2, cylinderId: blue.id, note })
      ).status,
    ).toBe(201);

    // The licence number a technician keeps on their profile goes beside their entries.
    const profile = (await technician.get("/api/profile")).body;
    const licensed = await technician
      .put("/api/profile")
      .set("If-Match", `"${profile.version}"`)
      .send({ name: profile.user.name, preferences: profile.preferences, licenceNumber: " L123456 " });
    expect(licensed.body.licenceNumber).toBe("L123456");
    const tooLong = await technician
      .put("/api/profile")
      .send({ name: profile.user.name, preferences: profile.preferences, licenceNumber: "x".repeat(41) });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.fields.licenceNumber).toBeDefined();

    const response = await owner.get("/api/register/export.csv");
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toMatch(/^text\/csv/);
    expect(response.headers["content-disposition"]).toMatch(/attachment; filename="refrigerant-register\.csv"/);
    const rows = parseCsv(response.text);
    expect(rows[0]).toEqual([
      "date (UTC)",
      "technician",
      "licence number",
      "equipment",
      "location",
      "refrigerant",
      "kind",
      "kg",
      "cylinder",
      "circuit",
      "note",
    ]);
    const body = rows.slice(1);
    expect(body).toHaveLength(6);
    const seniorRow = body.find((row) => row[1] === "Priya Raman")!;
    // RFC 4180 §2: the comma and quotes inside the label and the note survive a round trip;
    // OWASP CSV Injection: a leading "=" is neutralised with an apostrophe.
    expect(seniorRow[8]).toBe('BM "Blue", 2');
    expect(seniorRow[10]).toBe(`'${note}`);
    expect(seniorRow[2]).toBe(""); // no licence number on Priya's profile: blank column
    expect(seniorRow).toMatchObject({
      3: "RTU-1 packaged rooftop unit",
      4: "Wattle Lane Clinic — main building — Roof, above the waiting room",
      5: "R407C",
      6: "Recovered from the system",
      7: "0.25",
      9: "2",
    });
    expect(response.text).toContain('"BM ""Blue"", 2"');

    const samsOnly = parseCsv(
      (await owner.get(`/api/register/export.csv?technicianId=${people[BELLBIRD.technician]}`)).text,
    ).slice(1);
    expect(samsOnly).toHaveLength(5);
    expect(samsOnly.every((row) => row[1] === "Sam Toko" && row[2] === "L123456")).toBe(true);
    const period = parseCsv((await owner.get("/api/register/export.csv?from=2026-07-01&to=2026-09-30")).text).slice(1);
    expect(period).toHaveLength(1);
    expect(period[0]![0]).toBe("2026-07-11T01:00:00.000Z");
    const backwards = await owner.get("/api/register/export.csv?from=2026-09-30&to=2026-07-01");
    expect(backwards.status).toBe(400);
    expect(backwards.body.fields.to).toMatch(/before its start/);
  });

  it("lets owners and seniors read everyone's register, technicians only their own, apprentices none", async () => {
    const all = (await senior.get("/api/register")).body;
    expect(all.allTechnicians).toBe(true);
    expect(all.movements).toHaveLength(6);
    expect(all.totals).toEqual(expect.arrayContaining([{ refrigerant: "R407C", kind: "recovered", kg: 3.85 }]));
    const own = (await technician.get("/api/register")).body;
    expect(own.allTechnicians).toBe(false);
    expect(
      own.movements.every((movement: { technician: { name: string } }) => movement.technician.name === "Sam Toko"),
    ).toBe(true);
    expect((await technician.get(`/api/register?technicianId=${people[BELLBIRD.senior]}`)).status).toBe(403);
    expect((await technician.get(`/api/register/export.csv?technicianId=${people[BELLBIRD.senior]}`)).status).toBe(403);
    expect((await apprentice.get("/api/register")).status).toBe(403);
    expect((await apprentice.get("/api/register/export.csv")).status).toBe(403);
    // Apprentices may still read a visit's refrigerant and the cylinders (they shadow visits read-only).
    expect((await apprentice.get(`/api/visits/${visitId}/refrigerant`)).status).toBe(200);
  });

  it("refuses to record on a signed-off visit", async () => {
    await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" });
    await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off" });
    const late = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "added-new", kg: 0.1, circuit: 1, cylinderId: fresh.id });
    expect(late.status).toBe(409);
    expect(
      (await technician.put(`/api/visits/${visitId}/refrigerant/charging/1`).send({ lineAdjustmentKg: 0 })).status,
    ).toBe(409);
  });

  it("hides every register record of another organisation behind 404", async () => {
    expect((await outsider.get(`/api/visits/${visitId}/refrigerant`)).status).toBe(404);
    expect(
      (
        await outsider
          .post(`/api/visits/${visitId}/refrigerant`)
          .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId: recovery.id })
      ).status,
    ).toBe(404);
    expect((await outsider.get(`/api/cylinders/${recovery.id}`)).status).toBe(404);
    expect((await outsider.post(`/api/cylinders/${recovery.id}/reclaim`).send({ kg: 1 })).status).toBe(404);
    expect((await outsider.get(`/api/equipment/${rooftopId}/refrigerant`)).status).toBe(404);
    expect((await outsider.get("/api/cylinders")).body.cylinders).toEqual([]);
    expect((await outsider.get("/api/register")).body.movements).toEqual([]);
    expect((await outsider.get(`/api/register?technicianId=${people[BELLBIRD.technician]}`)).status).toBe(400);
    expect((await technician.get("/api/cylinders/not-a-uuid")).status).toBe(404);

    // Their own visit cannot draw on Bellbird's cylinder either.
    const customer = (await outsider.post("/api/customers").send({ name: "Frostline Foods" })).body.customer;
    const site = (await outsider.post("/api/sites").send({ customerId: customer.id, name: "Depot" })).body.site;
    const unit = (
      await outsider.post("/api/equipment").send({
        siteId: site.id,
        name: "Dock cool room",
        kind: "cool room",
        refrigerant: "R407C",
        circuits: [{ number: 1, factoryChargeKg: 3, meteringDevice: "txv" }],
      })
    ).body.equipment;
    const theirVisit = (await outsider.post("/api/visits").send({ equipmentId: unit.id, reason: "Leak search" })).body
      .visit.id;
    const borrowed = await outsider
      .post(`/api/visits/${theirVisit}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId: recovery.id });
    expect(borrowed.status).toBe(400);
    expect(borrowed.body.fields.cylinderId).toMatch(/your company's cylinders/);
  });

  it("sends a recovery cylinder's contents for reclaim from the cylinder itself", async () => {
    const tooMuch = await technician.post(`/api/cylinders/${recovery.id}/reclaim`).send({ kg: 50 });
    expect(tooMuch.status).toBe(400);
    const sent = await technician
      .post(`/api/cylinders/${recovery.id}/reclaim`)
      .send({ kg: 5.2, note: "Collected by the reclaimer" });
    expect(sent.status).toBe(201);
    expect(sent.body.movement).toMatchObject({ kind: "sent-for-reclaim", visitId: null, equipmentId: null });
    expect(sent.body.cylinder.contentsKg).toBeCloseTo(0, 6);
    expect((await technician.post(`/api/cylinders/${fresh.id}/reclaim`).send({ kg: 1 })).status).toBe(400);
  });
});
