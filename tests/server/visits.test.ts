import sharp from "sharp";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, diagnose, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { bellbirdAndOutsider, signedIn } from "../setup/demo-accounts.ts";
import { demoUnitIds } from "../setup/demo-units.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** The demo clinic stands at 85 m: gauges there read against the ISO 2533 atmosphere at that altitude. */
const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
/** Gauge pressure at which R407C has the wanted saturation temperature. */
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));

/** A settled reading on the demo rooftop unit: dew 6 °C at suction, bubble 42 °C at the liquid port. */
const rooftopReading = {
  circuit: 1,
  suctionPressureKPa: gauge(6, "dew"),
  suctionLineTempC: 12,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  dischargeLineTempC: 78,
  returnAirDryBulbC: 24,
  returnAirWetBulbC: 17,
  supplyAirDryBulbC: 13,
  outdoorAirDryBulbC: 31,
  runMinutes: 20,
};

describe("visits and the run log API", () => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let apprentice: Agent;
  let outsider: Agent;
  let rooftopId: string;
  let visitId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    ({ technician, senior, apprentice, outsider } = await bellbirdAndOutsider(testApp));
    rooftopId = (await demoUnitIds(technician)).rooftop;
  });
  afterAll(() => testApp.close());

  it("lists the demo equipment with nameplates, and 401 without a session", async () => {
    const response = await technician.get("/api/equipment");
    expect(response.status).toBe(200);
    expect(response.body.equipment).toHaveLength(3);
    const rooftop = response.body.equipment.find((unit: { id: string }) => unit.id === rooftopId);
    expect(rooftop.circuits).toHaveLength(2);
    expect(rooftop.circuits[0]).toMatchObject({ meteringDevice: "txv", factoryChargeKg: 4.2 });
    expect((await request(testApp.app).get("/api/equipment")).status).toBe(401);
  });

  it("creates equipment with validation messages per field", async () => {
    const sites = (await technician.get("/api/sites")).body.sites;
    const bad = await technician
      .post("/api/equipment")
      .send({ siteId: sites[0].id, name: "", kind: "wall split", refrigerant: "R999", circuits: [] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(["name", "refrigerant", "circuits"]));
    const good = await technician.post("/api/equipment").send({
      siteId: sites[0].id,
      name: "Reception ducted split",
      kind: "ducted split",
      refrigerant: "R410A",
      circuits: [{ number: 1, factoryChargeKg: 3.1, meteringDevice: "fixed-orifice" }],
    });
    expect(good.status).toBe(201);
    expect(good.body.equipment).toMatchObject({ name: "Reception ducted split", customerName: "Wattle Lane Clinic" });
    expect((await apprentice.post("/api/equipment").send({})).status).toBe(403);
  });

  it("starts a visit and records a reading whose stored result is the engine's diagnosis", async () => {
    const created = await technician
      .post("/api/visits")
      .send({ equipmentId: rooftopId, reason: "Not cooling the waiting room" });
    expect(created.status).toBe(201);
    visitId = created.body.visit.id;
    expect(created.body.visit.status).toBe("open");

    const response = await technician.post(`/api/visits/${visitId}/readings`).send(rooftopReading);
    expect(response.status).toBe(201);
    const { reading } = response.body;
    // Refrigerant, metering device and nameplate targets come from the equipment.
    expect(reading.input).toMatchObject({
      refrigerant: "R407C",
      meteringDevice: "txv",
      targetSuperheatK: 6,
      targetSubcoolingK: 5,
    });
    const { circuit: _circuit, ...fields } = rooftopReading;
    expect(reading.input.atmosphericPressureKPa).toBe(ATMOSPHERE);
    expect(reading.result).toEqual(
      diagnose({
        ...fields,
        refrigerant: "R407C",
        meteringDevice: "txv",
        targetSuperheatK: 6,
        targetSubcoolingK: 5,
        compressorRla: 11.8,
        application: "comfort-cooling",
        atmosphericPressureKPa: ATMOSPHERE,
        chargeKg: 4.2,
      }),
    );
    // The correct charge comes from the circuit's record too (nameplate, no line-set adjustment).
    expect(reading.input.chargeKg).toBe(4.2);
    // Superheat from the dew point, subcooling from the bubble point (R407C glides ~5 K).
    expect(reading.result.superheatK).toBeCloseTo(6, 1);
    expect(reading.result.subcoolingK).toBeCloseTo(5, 1);
  });

  it("refuses impossible readings with field messages and keeps nothing", async () => {
    const response = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send({ ...rooftopReading, suctionPressureKPa: 2000, liquidPressureKPa: 1500 });
    expect(response.status).toBe(400);
    expect(response.body.fields.suctionPressureKPa).toMatch(/below liquid pressure/);
    const typo = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send({ ...rooftopReading, suctionPressureKPa: "abc" });
    expect(typo.status).toBe(400);
    expect(typo.body.fields.suctionPressureKPa).toMatch(/must be a number in kPa gauge/);
    const missing = await technician.post(`/api/visits/${visitId}/readings`).send({ ...rooftopReading, circuit: 3 });
    expect(missing.status).toBe(400);
    expect(missing.body.fields.circuit).toMatch(/2 circuit/);
    const visit = await technician.get(`/api/visits/${visitId}`);
    expect(visit.body.visit.readings).toHaveLength(1);
  });

  it("records adjustments and comments on the timeline", async () => {
    const noMass = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ circuit: 1, kind: "charge-added", description: "Topped up" });
    expect(noMass.status).toBe(400);
    expect(noMass.body.fields.amountKg).toBeDefined();
    // Refrigerant added is a register movement: without its cylinder the register could not record it.
    const noCylinder = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ circuit: 1, kind: "charge-added", description: "Topped up", amountKg: 0.4 });
    expect(noCylinder.status).toBe(400);
    expect(noCylinder.body.fields.cylinderId).toMatch(/Choose the cylinder/);
    const added = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ circuit: 1, kind: "metering", description: "Opened the TXV a quarter turn" });
    expect(added.status).toBe(201);
    const visit = (await senior.get(`/api/visits/${visitId}`)).body.visit;
    const comment = await senior
      .post(`/api/visits/${visitId}/comments`)
      .send({ body: "Superheat looks right; watch the DLT", readingId: visit.readings[0].id });
    expect(comment.status).toBe(201);
    expect(comment.body.comment.author.name).toBe("Priya Raman");
    // The comment names its reading itself: a long run log's older pages are not held by the reader.
    const named = { circuit: visit.readings[0].circuit, takenAt: visit.readings[0].takenAt };
    expect(comment.body.comment.reading).toEqual(named);
    const withComment = (await technician.get(`/api/visits/${visitId}`)).body.visit;
    expect(
      withComment.comments.find((candidate: { id: string }) => candidate.id === comment.body.comment.id).reading,
    ).toEqual(named);
    expect((await apprentice.post(`/api/visits/${visitId}/comments`).send({ body: "hi" })).status).toBe(403);
  });

  it("moves through review: submit, send back with a reason, resubmit, sign off, then closed", async () => {
    expect((await technician.post(`/api/visits/${visitId}/review`).send({ action: "sign-off" })).status).toBe(403);
    expect((await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" })).body.visit.status).toBe(
      "awaiting-review",
    );
    const noReason = await senior.post(`/api/visits/${visitId}/review`).send({ action: "send-back" });
    expect(noReason.status).toBe(400);
    const sentBack = await senior
      .post(`/api/visits/${visitId}/review`)
      .send({ action: "send-back", reason: "Log a reading on circuit 2 too" });
    expect(sentBack.body.visit).toMatchObject({ status: "sent-back", reviewNote: "Log a reading on circuit 2 too" });
    expect(sentBack.body.visit.comments.at(-1).body).toMatch(/circuit 2/);
    await technician.post(`/api/visits/${visitId}/readings`).send({ ...rooftopReading, circuit: 2 });
    await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" });
    const signed = await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off", note: "Good work" });
    expect(signed.body.visit).toMatchObject({ status: "signed-off", signedOffBy: { name: "Priya Raman" } });
    const late = await technician.post(`/api/visits/${visitId}/readings`).send(rooftopReading);
    expect(late.status).toBe(409);
    expect((await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off" })).status).toBe(409);
  });

  it("hides every record from another organisation behind 404", async () => {
    expect((await outsider.get(`/api/visits/${visitId}`)).status).toBe(404);
    expect((await outsider.get(`/api/equipment/${rooftopId}`)).status).toBe(404);
    expect((await outsider.post(`/api/visits/${visitId}/readings`).send(rooftopReading)).status).toBe(404);
    expect((await outsider.post("/api/visits").send({ equipmentId: rooftopId, reason: "Sneaky visit" })).status).toBe(
      400,
    );
    expect((await outsider.get("/api/visits")).body.visits).toEqual([]);
    expect((await technician.get("/api/visits/not-a-uuid")).status).toBe(404);
  });

  it("shows the equipment's visits and the last settled reading per circuit", async () => {
    const response = await technician.get(`/api/equipment/${rooftopId}`);
    expect(response.status).toBe(200);
    expect(response.body.visits[0]).toMatchObject({ id: visitId, status: "signed-off", readingCount: 2 });
    expect(response.body.lastSettled).toHaveLength(2);
  });

  it("e-mails the report to a customer contact with a link built from APP_URL", async () => {
    const bad = await technician.post(`/api/visits/${visitId}/report/send`).send({ to: "not-an-address" });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.to).toMatch(/e-mail/);
    const sent = await technician
      .post(`/api/visits/${visitId}/report/send`)
      .send({ to: "facilities@wattlelane.example" });
    expect(sent.status).toBe(200);
    const mail = await testApp.mailbox.waitFor((message) => message.to.includes("facilities@wattlelane.example"));
    // The subject is RFC 2047-encoded (it holds an em dash); the text part reads plainly.
    expect(mail.decoded).toMatch(/Subject: =\?UTF-8\?Q\?Service_report:_RTU-1/);
    expect(mail.decoded).toContain("RTU-1 packaged rooftop unit");
    expect(mail.decoded).toContain("Circuit 1, last reading:");
    expect(mail.decoded).toContain(`http://satura.test/visits/${visitId}/report`);
    expect(mail.decoded).toContain("Opened the TXV a quarter turn");
    // Without the sender's zone the e-mail writes UTC and names it; the date reads "2 Dec 2026, 14:05", never 12/2/26.
    expect(mail.decoded).toMatch(
      /Started \d{1,2} (Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec) \d{4}, [0-2]\d:[0-5]\d \(UTC time\)/,
    );
    const badZone = await technician
      .post(`/api/visits/${visitId}/report/send`)
      .send({ to: "facilities@wattlelane.example", timeZone: "Mars/Olympus_Mons" });
    expect(badZone.status).toBe(400);
    expect(badZone.body.fields.timeZone).toMatch(/time zone/);
    await technician
      .post(`/api/visits/${visitId}/report/send`)
      .send({ to: "zoned@wattlelane.example", timeZone: "Australia/Sydney" });
    const zoned = await testApp.mailbox.waitFor((message) => message.to.includes("zoned@wattlelane.example"));
    expect(zoned.decoded).toMatch(/Started \d{1,2} [A-Z][a-z]{2} \d{4}, [0-2]\d:[0-5]\d \(Australia\/Sydney time\)/);
    expect((await apprentice.post(`/api/visits/${visitId}/report/send`).send({ to: "x@example.com" })).status).toBe(
      403,
    );
    expect((await outsider.post(`/api/visits/${visitId}/report/send`).send({ to: "x@example.com" })).status).toBe(404);
  });

  it("creates customers and sites, refusing a site under another organisation's customer", async () => {
    const customer = await technician.post("/api/customers").send({ name: "Bellbird Creek Library", contactEmail: "" });
    expect(customer.status).toBe(201);
    expect(customer.body.customer).toMatchObject({ name: "Bellbird Creek Library", contactEmail: null });
    const badEmail = await technician.post("/api/customers").send({ name: "X", contactEmail: "nope" });
    expect(badEmail.body.fields.contactEmail).toBeDefined();
    const site = await technician
      .post("/api/sites")
      .send({ customerId: customer.body.customer.id, name: "Reading room", altitudeM: 40 });
    expect(site.status).toBe(201);
    expect(site.body.site).toMatchObject({ customerName: "Bellbird Creek Library", altitudeM: 40 });
    const foreign = await outsider
      .post("/api/sites")
      .send({ customerId: customer.body.customer.id, name: "Not theirs" });
    expect(foreign.status).toBe(400);
    expect(foreign.body.fields.customerId).toBeDefined();
    expect((await outsider.get("/api/customers")).body.customers).toEqual([]);
  });

  it("accepts photos by content, refuses other files, and serves thumbnails", async () => {
    const open = (await technician.post("/api/visits").send({ equipmentId: rooftopId, reason: "Photo check visit" }))
      .body.visit.id;
    const png = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#88aacc" } })
      .png()
      .toBuffer();
    const uploaded = await technician
      .post(`/api/visits/${open}/photos`)
      .field("kind", "nameplate")
      .attach("photo", png, "plate.png");
    expect(uploaded.status).toBe(201);
    const thumbnail = await technician.get(uploaded.body.photo.thumbnailUrl).buffer(true);
    expect(thumbnail.status).toBe(200);
    expect(thumbnail.headers["content-type"]).toBe("image/webp");
    expect((await sharp(thumbnail.body).metadata()).width).toBe(320);
    const fake = await technician
      .post(`/api/visits/${open}/photos`)
      .attach("photo", Buffer.from("not an image"), "evil.jpg");
    expect(fake.status).toBe(415);
    expect((await outsider.get(uploaded.body.photo.url)).status).toBe(404);
  });
});
