import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { diagnose, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

// A built-in case: Wattle Lane RTU-1 circuit 2, R407C TXV, short of charge (data/casebook/).
const BUILT_IN = "wattle-lane-rtu1-c2-oily-flare";

/** Gauge pressure at which R407C has the wanted saturation temperature (dew for suction, bubble for liquid, TRADE.md §1.1). */
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Math.round(saturationPressure("R407C", temperatureC, point) - 101.325);

const authored = {
  title: "Clinic rooftop after a coil clean",
  difficulty: "starter",
  story: {
    site: "A two-storey clinic",
    equipment: "Packaged rooftop unit on R407C with a TXV",
    complaint: "Check after the condenser coil was cleaned",
    conditions: "Warm afternoon, running 25 minutes",
  },
  input: {
    refrigerant: "R407C",
    meteringDevice: "txv",
    suctionPressureKPa: gauge(7, "dew"),
    suctionLineTempC: 13,
    liquidPressureKPa: gauge(45, "bubble"),
    liquidLineTempC: 40,
    targetSubcoolingK: 5,
    outdoorAirDryBulbC: 33,
    runMinutes: 25,
  },
  reasoning: "Subcooling on the nameplate target and superheat in the valve band: normal.",
  safetyTopics: ["electrical"],
};

describe("casebook API", () => {
  let testApp: TestApp;
  let apprentice: Agent;
  let senior: Agent;
  let owner: Agent;
  let technician: Agent;
  let outsider: Agent;
  let apprenticeId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    const ids = await seedBellbird(testApp);
    apprenticeId = ids[BELLBIRD.apprentice]!;
    apprentice = await signedIn(testApp.app, BELLBIRD.apprentice);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
  });
  afterAll(() => testApp.close());

  it("lists the built-in library to everyone signed in, and 401 without a session", async () => {
    const response = await apprentice.get("/api/cases");
    expect(response.status).toBe(200);
    expect(response.body.cases.length).toBeGreaterThanOrEqual(30);
    expect(response.body.cases.find((c: { id: string }) => c.id === BUILT_IN)).toMatchObject({
      source: "built-in",
      refrigerant: "R407C",
      attempts: 0,
    });
    expect((await request(testApp.app).get("/api/cases")).status).toBe(401);
  });

  it("hides the answers from the apprentice and shows them to authors (preview)", async () => {
    const forApprentice = await apprentice.get(`/api/cases/${BUILT_IN}`);
    expect(forApprentice.status).toBe(200);
    expect(forApprentice.body.case.expected).toBeNull();
    expect(forApprentice.body.case.input.refrigerant).toBe("R407C");
    const forSenior = await senior.get(`/api/cases/${BUILT_IN}`);
    expect(forSenior.body.case.expected.chargeState).toBe("undercharged");
    expect((await apprentice.get("/api/cases/no-such-case")).status).toBe(404);
  });

  it("scores an attempt: ±0.5 K accepted, one value wrong, with the working and the safety notes", async () => {
    const expected = (await senior.get(`/api/cases/${BUILT_IN}`)).body.case.expected;
    const response = await apprentice.post("/api/attempts").send({
      caseId: BUILT_IN,
      answers: {
        evaporatingTempC: expected.evaporatingTempC + 0.4, // within ±0.5 K
        condensingTempC: expected.condensingTempC - 0.5, // on the edge: still right
        superheatK: expected.superheatK + 5, // the bubble point used by mistake: wrong
        subcoolingK: expected.subcoolingK,
        chargeState: "undercharged",
        reasoning: "Low subcooling on a TXV with high superheat",
      },
    });
    expect(response.status).toBe(201);
    const { attempt } = response.body;
    expect(attempt.score).toMatchObject({ correctCount: 4, total: 5, allCorrect: false, toleranceK: 0.5 });
    expect(
      attempt.score.marks
        .filter((mark: { correct: boolean }) => !mark.correct)
        .map((mark: { field: string }) => mark.field),
    ).toEqual(["superheatK"]);
    expect(attempt.worked.map((step: { kind: string }) => step.kind)).toEqual([
      "saturation",
      "saturation",
      "difference",
      "difference",
      "target",
      "target",
      "verdict",
    ]);
    expect(attempt.worked[0]).toMatchObject({ point: "dew", isBlend: true });
    // The case names nitrogen (leak repair); the verdict brings liquid-refrigerant handling.
    expect(attempt.safety.map((note: { topic: string }) => note.topic)).toEqual(["liquid-refrigerant", "nitrogen"]);
    expect(attempt.user.name).toBe("Jordan Vu");
  });

  it("refuses a malformed attempt with field messages", async () => {
    const response = await apprentice
      .post("/api/attempts")
      .send({ caseId: BUILT_IN, answers: { evaporatingTempC: "cold", chargeState: "broken", reasoning: "" } });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields)).toEqual(
      expect.arrayContaining(["answers.evaporatingTempC", "answers.chargeState", "answers.reasoning"]),
    );
  });

  it("shows the apprentice's progress by charge state and refrigerant", async () => {
    const response = await apprentice.get("/api/attempts/progress");
    expect(response.status).toBe(200);
    expect(response.body.progress).toMatchObject({ attempts: 1, solved: 0 });
    expect(response.body.progress.byState).toEqual([
      { key: "undercharged", attempts: 1, solved: 0, answersRight: 4, answersTotal: 5 },
    ]);
    expect(response.body.progress.byRefrigerant[0].key).toBe("R407C");
    const list = await apprentice.get("/api/cases");
    expect(list.body.cases.find((c: { id: string }) => c.id === BUILT_IN)).toMatchObject({
      attempts: 1,
      solved: false,
    });
  });

  it("lets seniors and owners see every apprentice's progress, and nobody else", async () => {
    const team = await senior.get("/api/attempts/progress/team");
    expect(team.status).toBe(200);
    const jordan = team.body.people.find((person: { user: { id: string } }) => person.user.id === apprenticeId);
    expect(jordan).toMatchObject({ user: { name: "Jordan Vu", role: "apprentice" }, progress: { attempts: 1 } });
    expect((await owner.get("/api/attempts/progress/team")).status).toBe(200);
    expect((await apprentice.get("/api/attempts/progress/team")).status).toBe(403);
    expect((await technician.get("/api/attempts/progress/team")).status).toBe(403);
    const theirs = await senior.get(`/api/attempts?userId=${apprenticeId}`);
    expect(theirs.body.attempts).toHaveLength(1);
    // An apprentice asking for someone else's list still gets only their own.
    const otherId = team.body.people[0].user.id;
    expect((await technician.get(`/api/attempts?userId=${otherId}`)).body.attempts).toHaveLength(0);
  });

  it("opens an attempt for its owner and for seniors; 404 for another organisation", async () => {
    const [first] = (await apprentice.get("/api/attempts")).body.attempts;
    expect((await apprentice.get(`/api/attempts/${first.id}`)).status).toBe(200);
    expect((await senior.get(`/api/attempts/${first.id}`)).status).toBe(200);
    expect((await technician.get(`/api/attempts/${first.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/attempts/${first.id}`)).status).toBe(404);
    expect((await outsider.get("/api/attempts/not-a-uuid")).status).toBe(404);
  });

  it("lets seniors author a draft whose answers come from the engine, preview it and publish it", async () => {
    expect((await apprentice.post("/api/cases").send(authored)).status).toBe(403);
    expect((await technician.post("/api/cases").send(authored)).status).toBe(403);
    const created = await senior.post("/api/cases").send(authored);
    expect(created.status).toBe(201);
    const draft = created.body.case;
    expect(draft).toMatchObject({ source: "organisation", status: "draft", editable: true, authorName: "Priya Raman" });
    const engine = diagnose(authored.input as Parameters<typeof diagnose>[0]);
    expect(draft.expected.chargeState).toBe(engine.chargeState);
    expect(draft.expected.superheatK).toBeCloseTo(engine.superheatK!, 9);

    // Drafts are invisible to apprentices until published.
    expect((await apprentice.get(`/api/cases/${draft.id}`)).status).toBe(404);
    expect((await apprentice.get("/api/cases")).body.cases.some((c: { id: string }) => c.id === draft.id)).toBe(false);
    expect((await apprentice.post(`/api/cases/${draft.id}/publish`)).status).toBe(403);

    expect(draft.version).toBe(1);
    const edited = await senior
      .put(`/api/cases/${draft.id}`)
      .set("If-Match", '"1"')
      .send({ ...authored, input: { ...authored.input, liquidLineTempC: 44.5 } });
    expect(edited.status).toBe(200);
    expect(edited.body.case.version).toBe(2);
    // Subcooling now 0.5 K against a 5 K target: the engine, not the author, changes the answer.
    expect(edited.body.case.expected.chargeState).toBe("undercharged");

    // An owner who opened the case before that edit: their copy is stale and is refused.
    const stale = await owner
      .put(`/api/cases/${draft.id}`)
      .set("If-Match", '"1"')
      .send({ ...authored, title: "Overwritten" });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/A newer version of this case was saved.*Reload/);
    expect((await senior.get(`/api/cases/${draft.id}`)).body.case.title).toBe(authored.title);
    expect((await owner.post(`/api/cases/${draft.id}/publish`).set("If-Match", '"1"')).status).toBe(409);

    const published = await owner.post(`/api/cases/${draft.id}/publish`).set("If-Match", '"2"');
    expect(published.status).toBe(200);
    expect(published.body.case.status).toBe("published");
    expect((await apprentice.get(`/api/cases/${draft.id}`)).status).toBe(200);
  });

  it("refuses validation errors in an authored case per field", async () => {
    const response = await senior
      .post("/api/cases")
      .send({ ...authored, title: "", input: { ...authored.input, suctionPressureKPa: 3000 } });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields)).toEqual(expect.arrayContaining(["title", "input.suctionPressureKPa"]));
  });

  it("keeps built-in cases read-only for everyone, with a clear message", async () => {
    const edit = await senior.put(`/api/cases/${BUILT_IN}`).send(authored);
    expect(edit.status).toBe(403);
    expect(edit.body.message).toMatch(/Built-in cases are shared by every organisation and cannot be changed/);
    expect((await owner.delete(`/api/cases/${BUILT_IN}`)).status).toBe(403);
    const publish = await owner.post(`/api/cases/${BUILT_IN}/publish`);
    expect(publish.status).toBe(409);
    expect(publish.body.message).toMatch(/cannot be changed/);
  });

  it("answers 404 for another organisation's case, whatever the action", async () => {
    const list = await senior.get("/api/cases");
    const own = list.body.cases.find((c: { source: string }) => c.source === "organisation");
    expect((await outsider.get(`/api/cases/${own.id}`)).status).toBe(404);
    expect((await outsider.put(`/api/cases/${own.id}`).set("If-Match", '"1"').send(authored)).status).toBe(404);
    expect((await outsider.post(`/api/cases/${own.id}/publish`).set("If-Match", '"1"')).status).toBe(404);
    expect((await outsider.delete(`/api/cases/${own.id}`).set("If-Match", '"1"')).status).toBe(404);
    expect(
      (
        await outsider.post("/api/attempts").send({
          caseId: own.id,
          answers: {
            evaporatingTempC: 7,
            condensingTempC: 45,
            superheatK: 6,
            subcoolingK: 5,
            chargeState: "normal",
            reasoning: "guess",
          },
        })
      ).status,
    ).toBe(404);
    // Their own list has the built-in library but not Bellbird's cases.
    const theirs = await outsider.get("/api/cases");
    expect(theirs.body.cases.some((c: { id: string }) => c.id === own.id)).toBe(false);
    expect(theirs.body.cases.some((c: { id: string }) => c.id === BUILT_IN)).toBe(true);
  });

  it("turns a real visit reading into a draft case without the customer's details", async () => {
    const units = (await technician.get("/api/equipment")).body.equipment;
    const rooftop = units.find((unit: { refrigerant: string }) => unit.refrigerant === "R407C");
    const visit = (await technician.post("/api/visits").send({ equipmentId: rooftop.id, reason: "Waiting room warm" }))
      .body.visit;
    const reading = (
      await technician.post(`/api/visits/${visit.id}/readings`).send({
        circuit: 1,
        // A reading carries measured values only; the nameplate gives the rest.
        ...authored.input,
        refrigerant: undefined,
        meteringDevice: undefined,
        targetSubcoolingK: undefined,
        note: "Spoke with the practice manager",
      })
    ).body.reading;
    expect((await apprentice.post("/api/cases/from-reading").send({ readingId: reading.id })).status).toBe(403);
    expect((await outsider.post("/api/cases/from-reading").send({ readingId: reading.id })).status).toBe(404);
    const response = await senior.post("/api/cases/from-reading").send({ readingId: reading.id });
    expect(response.status).toBe(201);
    const made = response.body.case;
    expect(made).toMatchObject({ status: "draft", fromReading: true, source: "organisation" });
    expect(made.input.suctionPressureKPa).toBe(authored.input.suctionPressureKPa);
    const text = JSON.stringify(made);
    for (const detail of ["Wattle Lane", "RTU-1", "practice manager", rooftop.name, visit.customerName])
      expect(text).not.toContain(detail);
  });

  it("generates a practice case on demand that reproduces from its id and can be attempted", async () => {
    const response = await apprentice
      .post("/api/cases/generate")
      .send({ refrigerant: "R32", meteringDevice: "capillary", fault: "restricted-metering", seed: 99 });
    expect(response.status).toBe(201);
    const made = response.body.case;
    expect(made).toMatchObject({ source: "generated", expected: null, editable: false });
    const again = await senior.get(`/api/cases/${encodeURIComponent(made.id)}`);
    expect(again.body.case.input).toEqual(made.input);
    expect(again.body.case.expected.chargeState).toBe("restricted-metering");
    const attempt = await apprentice.post("/api/attempts").send({
      caseId: made.id,
      answers: { ...again.body.case.expected, reasoning: "High superheat with high subcooling" },
    });
    expect(attempt.status).toBe(201);
    expect(attempt.body.attempt.score.allCorrect).toBe(true);
    expect((await senior.put(`/api/cases/${encodeURIComponent(made.id)}`).send(authored)).status).toBe(403);
    const bad = await apprentice
      .post("/api/cases/generate")
      .send({ refrigerant: "R744", meteringDevice: "txv", fault: "normal" });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.refrigerant).toMatch(/R410A/);
  });
});
