import type { AuthLimits } from "@server/auth/rate-limits.ts";
import type { RouteKey } from "@server/auth/route-permissions.ts";
import { CASE_ANSWERS, CASE_DRAFT, type BellbirdRecords } from "./two-companies.ts";

/** Throttles high enough for tests that call every route from one address (the throttles have their own tests). */
export const UNTHROTTLED: Partial<AuthLimits> = {
  signInPerIp: 100_000,
  signInFailuresPerAccountAndClient: 100_000,
  signInFailuresPerAccount: 100_000,
  resetPerIp: 100_000,
  resetPerAccount: 100_000,
  signUpPerIp: 100_000,
};

/** Public routes that end or replace the caller's session: call them with a session of their own. */
export const SESSION_ROUTES: ReadonlySet<RouteKey> = new Set([
  "POST /api/auth/sign-out",
  "POST /api/auth/sign-up",
  "POST /api/auth/sign-in",
  "POST /api/invitations/accept",
]);

/** A password that passes the rules but is nobody's: a sample never signs anyone in. */
const SAMPLE_PASSWORD = "evaporator-coil-77";
/** The shape of a link token (32 bytes in base64url) that matches no stored token. */
const UNKNOWN_TOKEN = "A".repeat(43);

/**
 * A valid body for every route that takes one, naming Bellbird's records: the matrix sends them
 * so that a record answers rather than the body, and the fuzz test mutates them one field at a
 * time so that a bad value meets an otherwise valid request, the way it reaches the database.
 * Multipart routes (photos, CSV import) are built by their callers.
 */
export function sampleBodies(records: BellbirdRecords): Partial<Record<RouteKey, Record<string, unknown>>> {
  return {
    "POST /api/auth/sign-up": {
      name: "Kim Frost",
      email: "kim@frostline.example",
      password: SAMPLE_PASSWORD,
      organisationName: "Frostline",
    },
    "POST /api/auth/sign-in": { email: "nobody@bellbird.example", password: SAMPLE_PASSWORD },
    "POST /api/auth/password-reset/request": { email: "owner@bellbird.example" },
    "POST /api/auth/password-reset/confirm": { token: UNKNOWN_TOKEN, password: SAMPLE_PASSWORD },
    "PATCH /api/members/:id": { role: "technician" },
    "POST /api/invitations": { email: "sample-invitee@bellbird.example", role: "apprentice" },
    "POST /api/invitations/preview": { token: UNKNOWN_TOKEN },
    "POST /api/invitations/accept": { token: UNKNOWN_TOKEN, name: "New Person", password: SAMPLE_PASSWORD },
    "PUT /api/profile": {
      name: "Same Name",
      preferences: { temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 },
      licenceNumber: "ARC-L123",
    },
    "PATCH /api/organisation/settings": { evacuationTargetMicrons: 500 },
    "POST /api/visits/:id/voids": {
      kind: "reading",
      recordId: records.readingId,
      reason: "Typed into the wrong field",
    },
    "POST /api/cylinders/:id/movements/:movementId/void": { reason: "Logged against the wrong cylinder" },
    "POST /api/customers": {
      name: "Sample Customer",
      contactName: "Ann Lee",
      contactEmail: "ann@example.com",
      contactPhone: "0400 000 000",
    },
    "POST /api/sites": {
      customerId: records.customerId,
      name: "Sample Site",
      address: "1 Main St\nBellbird",
      altitudeM: 40,
    },
    "POST /api/equipment": {
      siteId: records.siteId,
      name: "Sample unit",
      kind: "wall split",
      location: "Plant room",
      maker: "Maker",
      model: "M-1",
      serial: "S-1",
      refrigerant: "R410A",
      circuits: [{ number: 1, factoryChargeKg: 2.5, meteringDevice: "txv", targetSuperheatK: 6, targetSubcoolingK: 5 }],
      compressorRlaA: 10,
      supplyVoltageV: 230,
      phases: 1,
    },
    "PUT /api/equipment/:id/charge-references/:circuit": {
      values: {
        subcoolingK: 5,
        superheatK: 6,
        evaporatingTempC: 6,
        condensingTempC: 42,
        outdoorAirDryBulbC: 31,
        returnAirDryBulbC: 25,
      },
      note: "From the commissioning sheet",
    },
    "DELETE /api/equipment/:id/charge-references/:circuit": { reason: "Condenser coil replaced" },
    "POST /api/visits": { equipmentId: records.equipmentId, reason: "Sample visit" },
    "POST /api/visits/:id/readings": {
      circuit: 1,
      takenAt: "2026-07-01T09:30:00+10:00",
      note: "Settled",
      suctionPressureKPa: 350,
      suctionLineTempC: 12,
      liquidPressureKPa: 1600,
      liquidLineTempC: 37,
    },
    "POST /api/visits/:id/adjustments": {
      circuit: 1,
      kind: "metering",
      description: "Opened the TXV a quarter turn",
      at: "2026-07-01T09:40:00Z",
    },
    "POST /api/visits/:id/comments": { body: "Looks fine", readingId: records.readingId },
    "POST /api/visits/:id/review": { action: "submit" },
    "POST /api/visits/:id/report/send": { to: "facilities@example.com" },
    "POST /api/visits/:id/electrical-checks": {
      target: "compressor",
      circuit: 1,
      supplyVolts: [230],
      nameplateV: 230,
      insulation: [{ megohms: 100, testVoltageV: 500, point: "C to earth" }],
      runningAmps: [8],
      ratedA: 10,
      note: "Contactor checked",
    },
    "POST /api/visits/:id/leak-searches": {
      method: "electronic-detector",
      placesChecked: ["Service valves", "Flare nuts"],
      leaks: [{ location: "Schrader core, suction port", severity: "small", repair: "Core replaced", repaired: true }],
      recheck: "no-leak",
      note: "Rechecked after repair",
    },
    "POST /api/visits/:id/standing-pressure-checks": {
      standingGaugeKPa: 500,
      equalisedTempC: 20,
      circuit: 1,
      note: "Condenser fan run until air off equalled air on",
    },
    "POST /api/visits/:id/pressure-tests": {
      section: "whole-system",
      startGaugeKPa: 2800,
      startTempC: 24,
      endGaugeKPa: 2795,
      endTempC: 24,
      ratedKPa: 4150,
      holdMinutes: 30,
      note: "Nitrogen",
    },
    "POST /api/visits/:id/evacuations": {
      targetMicrons: 500,
      samples: [{ minutes: 0, microns: 5000 }],
      note: "Pump on",
    },
    "POST /api/visits/:id/evacuations/:evacuationId/samples": { microns: 400, minutes: 30 },
    "PATCH /api/visits/:id/evacuations/:evacuationId": { isolateNow: true, note: "Valved off" },
    "POST /api/visits/:id/refrigerant": {
      kind: "recovered",
      kg: 0.5,
      circuit: 1,
      cylinderId: records.cylinderId,
      at: "2026-07-01T10:00:00Z",
      note: "Recovered",
    },
    "PUT /api/visits/:id/refrigerant/charging/:circuit": { lineAdjustmentKg: 0.2 },
    "POST /api/cylinders": {
      label: "SAMPLE-1",
      kind: "recovery",
      refrigerant: "R407C",
      waterCapacityKg: 26,
      tareKg: 14,
      initialContentsKg: 0,
      serial: "S1",
    },
    "POST /api/cylinders/:id/reclaim": { kg: 0.2, note: "To the reclaimer" },
    "POST /api/cases": CASE_DRAFT,
    "POST /api/cases/from-reading": { readingId: records.readingId },
    "POST /api/cases/generate": { refrigerant: "R410A", meteringDevice: "txv", fault: "undercharged", seed: 7 },
    "PUT /api/cases/:id": CASE_DRAFT,
    "POST /api/attempts": { caseId: records.caseId, answers: CASE_ANSWERS },
  };
}
