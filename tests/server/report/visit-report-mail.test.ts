/**
 * The report's e-mail writes its times with the app's one date format, in the sender's zone,
 * and names that zone. Offsets from the IANA time zone database (https://www.iana.org/time-zones):
 * New South Wales is on AEDT, UTC+11, in December; UTC is UTC.
 */
import { describe, expect, it } from "vitest";
import { VisitSchema } from "@shared/schemas/visits.ts";
import { visitReportMail } from "@server/report/visit-report-mail.ts";

const visit = VisitSchema.parse({
  id: "0b6f6f3e-8a77-4d4b-9d5c-3f1f7a1a2b01",
  equipmentId: "0b6f6f3e-8a77-4d4b-9d5c-3f1f7a1a2b02",
  equipmentName: "CR-2 cool room",
  siteName: "Wattle Lane Clinic",
  customerName: "Wattle Lane Health",
  refrigerant: "R448A",
  reason: "Box not holding 2 °C",
  status: "signed-off",
  startedAt: "2026-12-02T03:05:00Z",
  readingCount: 0,
  technicians: [],
  yourLastActivityAt: null,
  customerContactEmail: null,
  reviewNote: null,
  signedOffBy: { id: "0b6f6f3e-8a77-4d4b-9d5c-3f1f7a1a2b03", name: "Priya Raman" },
  signedOffAt: "2026-12-02T13:30:00Z",
  readings: [],
  circuitLogs: [],
  adjustments: [],
  comments: [],
  photos: [],
  revision: "fixture",
  atmosphere: {
    pressureKPa: 101.325,
    basis: "standard",
    altitudeM: null,
    description: "standard atmosphere: site has no altitude",
  },
  events: [],
});

describe("visitReportMail", () => {
  it("writes the start and the sign-off in the sender's zone, named, with the day across midnight", () => {
    const mail = visitReportMail(
      visit,
      "https://satura.test/visits/x/report",
      "facilities@example.com",
      "org",
      "Australia/Sydney",
    );
    expect(mail.text).toContain("Started 2 Dec 2026, 14:05 (Australia/Sydney time).");
    // 13:30 UTC is 00:30 the next day in Sydney.
    expect(mail.text).toContain("signed off by Priya Raman on 3 Dec 2026, 00:30");
  });

  it("writes UTC and says so when the sender's zone is not known", () => {
    const mail = visitReportMail(visit, "https://satura.test/visits/x/report", "facilities@example.com", "org");
    expect(mail.text).toContain("Started 2 Dec 2026, 03:05 (UTC time).");
    expect(mail.text).toContain("on 2 Dec 2026, 13:30");
    expect(mail.text).not.toMatch(/\d{1,2}\/\d{1,2}\/\d{2,4}/);
  });
});
