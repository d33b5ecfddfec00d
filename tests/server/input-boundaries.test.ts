import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { saturationPressure } from "@shared/engine/index.ts";
import { BROKEN_CHARACTER_MESSAGE, CONTROL_CHARACTER_MESSAGE, SINGLE_LINE_MESSAGE } from "@shared/schemas/text.ts";
import { OUT_OF_RANGE_MESSAGE } from "@shared/schemas/dates.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { CASE_ANSWERS, CASE_DRAFT } from "../setup/two-companies.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const NUL = "\u0000";
/** The first half of a surrogate pair, alone: JSON carries it ("\ud83d"), PostgreSQL's jsonb cannot. */
const LONE_SURROGATE = "\uD83D";

const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - 101.325).toFixed(1));

/**
 * Issue 13, item 5: seven inputs that reached PostgreSQL and came back as 500s. Each is now
 * refused where it enters, by the one text schema, the one date schema or the route's own
 * parameter check, with a field message; nothing is stored.
 */
describe("input boundaries", () => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let visitId: string;
  let customerId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    const rooftop = (await technician.get("/api/equipment")).body.equipment.find(
      (unit: { refrigerant: string }) => unit.refrigerant === "R407C",
    );
    visitId = (await technician.post("/api/visits").send({ equipmentId: rooftop.id, reason: "Boundary checks" })).body
      .visit.id;
    customerId = (await technician.get("/api/customers")).body.customers[0].id;
  });
  afterAll(() => testApp.close());

  describe("text", () => {
    it.each([
      ["a customer's name", () => technician.post("/api/customers").send({ name: `Wattle${NUL}Lane` }), "name"],
      [
        "a site's address",
        () => technician.post("/api/sites").send({ customerId, name: "Depot", address: `1 Main St${NUL}` }),
        "address",
      ],
      [
        "a profile name",
        () =>
          technician.put("/api/profile").send({
            name: `Sam${NUL}`,
            preferences: { temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 },
          }),
        "name",
      ],
      ["a comment", () => technician.post(`/api/visits/${visitId}/comments`).send({ body: `Checked${NUL}` }), "body"],
      [
        "a reading note",
        () =>
          technician.post(`/api/visits/${visitId}/readings`).send({
            circuit: 1,
            note: `x${NUL}`,
            suctionPressureKPa: gauge(6, "dew"),
            suctionLineTempC: 12,
            liquidPressureKPa: gauge(42, "bubble"),
            liquidLineTempC: 37,
          }),
        "note",
      ],
      [
        "a leak-search place",
        () =>
          technician
            .post(`/api/visits/${visitId}/leak-searches`)
            .send({ method: "electronic-detector", placesChecked: [`Service valves${NUL}`] }),
        "placesChecked.0",
      ],
      ["a cylinder filter", () => technician.get("/api/cylinders?refrigerant=R32%00"), "refrigerant"],
    ])("refuses a NUL character in %s (400, field named)", async (_what, call, field) => {
      const response = await call();
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.fields[field]).toMatch(/control characters|one line/);
    });

    it.each([
      [
        "a leak-search note (stored in jsonb)",
        () =>
          technician
            .post(`/api/visits/${visitId}/leak-searches`)
            .send({ method: "electronic-detector", placesChecked: ["Caps"], note: `ok ${LONE_SURROGATE}` }),
        "note",
      ],
      [
        "a case story (stored in jsonb)",
        () =>
          senior.post("/api/cases").send({
            ...CASE_DRAFT,
            title: "Surrogate case",
            story: { ...CASE_DRAFT.story, site: `Roof ${LONE_SURROGATE}` },
          }),
        "story.site",
      ],
      ["a customer's name", () => technician.post("/api/customers").send({ name: `Caf${LONE_SURROGATE}` }), "name"],
    ])("refuses a lone UTF-16 surrogate in %s", async (_what, call, field) => {
      const response = await call();
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.fields[field]).toBe(BROKEN_CHARACTER_MESSAGE);
    });

    it("keeps line breaks and tabs where text runs over lines, and whole characters beyond the BMP", async () => {
      const comment = await technician
        .post(`/api/visits/${visitId}/comments`)
        .send({ body: "Line one\n\tLine two ❄️ 🧊" });
      expect(comment.status).toBe(201);
      expect(comment.body.comment.body).toBe("Line one\n\tLine two ❄️ 🧊");
      const name = await technician.post("/api/customers").send({ name: "Two\nlines" });
      expect(name.status).toBe(400);
      expect(name.body.fields.name).toBe(SINGLE_LINE_MESSAGE);
      const bell = await technician.post(`/api/visits/${visitId}/comments`).send({ body: "Ring \u0007" });
      expect(bell.body.fields.body).toBe(CONTROL_CHARACTER_MESSAGE);
    });
  });

  describe("dates", () => {
    it.each([
      [
        "a reading at year 0000",
        () =>
          technician.post(`/api/visits/${visitId}/readings`).send({
            circuit: 1,
            takenAt: "0000-01-01T00:00:00Z",
            suctionPressureKPa: gauge(6, "dew"),
            suctionLineTempC: 12,
            liquidPressureKPa: gauge(42, "bubble"),
            liquidLineTempC: 37,
          }),
        "takenAt",
      ],
      [
        "an adjustment in the year 10000 UTC",
        () =>
          technician
            .post(`/api/visits/${visitId}/adjustments`)
            .send({ kind: "airflow", description: "Fan speed up", at: "9999-12-31T23:59:59-14:00" }),
        "at",
      ],
      ["a register filter from year 0000", () => senior.get("/api/register?from=0000-01-01"), "from"],
    ])("refuses %s with a field message", async (_what, call, field) => {
      const response = await call();
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.fields[field]).toBe(OUT_OF_RANGE_MESSAGE);
    });

    it("takes the widest period the database can hold", async () => {
      const response = await senior.get("/api/register?from=0001-01-01&to=9999-12-31");
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      expect(Array.isArray(response.body.movements)).toBe(true);
    });

    it("reports a CSV time cell of 99999 (the year 99999) as a problem row, not a 500", async () => {
      const csv = [
        "Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C",
        `99999,${gauge(6, "dew")},12,${gauge(42, "bubble")},37`,
        `10:05,${gauge(6, "dew")},12,${gauge(42, "bubble")},37`,
      ].join("\n");
      const response = await technician
        .post(`/api/visits/${visitId}/readings/import`)
        .field("circuit", "1")
        .field("dayStart", "2026-12-01T00:00:00+11:00")
        .field("mode", "valid-only")
        .attach("file", Buffer.from(csv), "log.csv");
      expect(response.status, JSON.stringify(response.body)).toBe(201);
      expect(response.body.problems).toEqual([expect.objectContaining({ line: 2, field: "takenAt" })]);
      expect(response.body.stored).toBe(1);
    });
  });

  it("answers 404 for a circuit that is not a whole number of the unit's circuits", async () => {
    for (const circuit of ["1.5", "abc", "9", "-1", "1e0"]) {
      const response = await technician
        .put(`/api/visits/${visitId}/refrigerant/charging/${circuit}`)
        .send({ lineAdjustmentKg: 0.2 });
      expect(response.status, circuit).toBe(404);
      expect(response.body.message).toBe("Circuit not found");
    }
    expect(
      (await technician.put(`/api/visits/${visitId}/refrigerant/charging/1`).send({ lineAdjustmentKg: 0.2 })).status,
    ).toBe(200);
  });

  it("answers 404 for a generated case id naming a refrigerant the generator does not make, 400 when asked to generate it", async () => {
    const id = "gen~1~txv~normal~R744";
    expect((await technician.get(`/api/cases/${encodeURIComponent(id)}`)).status).toBe(404);
    const attempt = await technician.post("/api/attempts").send({
      caseId: id,
      answers: CASE_ANSWERS,
    });
    expect(attempt.status).toBe(404);
    const generate = await technician
      .post("/api/cases/generate")
      .send({ refrigerant: "R744", meteringDevice: "txv", fault: "normal" });
    expect(generate.status).toBe(400);
    expect(generate.body.fields.refrigerant).toMatch(/The generator makes cases for .*R410A/);
  });

  it("answers one of two simultaneous sign-ups for one address 201 and the other 409", async () => {
    const body = {
      name: "Kim Frost",
      email: "race@frostline.example",
      password: "evaporator-coil-77",
      organisationName: "Frostline",
    };
    const responses = await Promise.all([1, 2].map(() => request(testApp.app).post("/api/auth/sign-up").send(body)));
    expect(responses.map((response) => response.status).sort()).toEqual([201, 409]);
    const refused = responses.find((response) => response.status === 409)!;
    expect(refused.body.fields.email).toMatch(/already has an account/);
  });
});
