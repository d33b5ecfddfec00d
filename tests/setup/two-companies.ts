import sharp from "sharp";
import request from "supertest";
import { ROLES, type Role } from "@shared/schemas/auth.ts";
import { hashPassword } from "@server/auth/password.ts";
import { createUser } from "@server/db/accounts.ts";
import type { TestApp } from "./test-app.ts";
import { seedBellbird, signedIn, signedInBellbird, signUpOtherCompany } from "./demo-accounts.ts";

export type Agent = Awaited<ReturnType<typeof signedIn>>;

/** A valid case draft (R410A, TXV, readings on target) for routes that take one. */
export const CASE_DRAFT = {
  title: "Matrix practice case",
  difficulty: "starter",
  story: {
    site: "A small office",
    equipment: "Wall split",
    complaint: "Warm in the afternoons",
    conditions: "32 °C outside",
  },
  input: {
    refrigerant: "R410A",
    meteringDevice: "txv",
    suctionPressureKPa: 820,
    suctionLineTempC: 13,
    liquidPressureKPa: 2650,
    liquidLineTempC: 38,
  },
  reasoning: "Superheat and subcooling are both near their targets.",
};

/** Answers to an attempt at a case, valid in shape (the figures of CASE_DRAFT, on target). */
export const CASE_ANSWERS = {
  evaporatingTempC: 5,
  condensingTempC: 40,
  superheatK: 6,
  subcoolingK: 5,
  chargeState: "normal",
  reasoning: "Both on target",
};

/** Records of the first company, one of each kind a route can name in its path. */
export interface BellbirdRecords {
  visitId: string;
  equipmentId: string;
  customerId: string;
  siteId: string;
  cylinderId: string;
  photoId: string;
  evacuationId: string;
  readingId: string;
  memberId: string;
  invitationId: string;
  caseId: string;
  attemptId: string;
}

export interface TwoCompanies {
  /** Signed-in agents of Bellbird (the demo company), one per role. */
  bellbird: Record<Role, Agent>;
  /** Signed-in agents of Coldfront, an unrelated company, one per role. */
  coldfront: Record<Role, Agent>;
  records: BellbirdRecords;
  userIds: Record<string, string>;
}

const COLDFRONT_PASSWORD = "frosty-coil-44-north";

/**
 * Two companies with one person of every role each, and one Bellbird record of every kind a
 * route names in its path (for role and company checks over the whole route table).
 */
export async function twoCompanies(testApp: TestApp): Promise<TwoCompanies> {
  const userIds = await seedBellbird(testApp);
  const bellbird = await signedInBellbird(testApp.app);

  const coldfront = {} as Record<Role, Agent>;
  const { agent, user } = await signUpOtherCompany(testApp.app);
  coldfront.owner = agent;
  const passwordHash = await hashPassword(COLDFRONT_PASSWORD);
  for (const role of ROLES.filter((candidate) => candidate !== "owner")) {
    const email = `${role}@coldfront.example`;
    await createUser(testApp.database.db, {
      organisationId: user.organisationId,
      name: `Coldfront ${role}`,
      email,
      role,
      passwordHash,
    });
    coldfront[role] = await signedIn(testApp.app, email, COLDFRONT_PASSWORD);
  }

  const { owner, senior, technician, apprentice } = bellbird;
  const ok = (response: request.Response, what: string) => {
    if (response.status >= 300) throw new Error(`${what}: ${response.status} ${JSON.stringify(response.body)}`);
    return response.body;
  };
  const unit = ok(await technician.get("/api/equipment"), "equipment").equipment.find(
    (candidate: { refrigerant: string }) => candidate.refrigerant === "R407C",
  );
  const customerId = ok(await technician.get("/api/customers"), "customers").customers[0].id;
  const siteId = ok(await technician.get("/api/sites"), "sites").sites[0].id;
  const visitId = ok(
    await technician.post("/api/visits").send({ equipmentId: unit.id, reason: "Matrix visit" }),
    "visit",
  ).visit.id;
  const readingId = ok(
    await technician.post(`/api/visits/${visitId}/readings`).send({
      circuit: 1,
      suctionPressureKPa: 350,
      suctionLineTempC: 12,
      liquidPressureKPa: 1600,
      liquidLineTempC: 37,
    }),
    "reading",
  ).reading.id;
  const cylinderId = ok(
    await technician
      .post("/api/cylinders")
      .send({ label: "MATRIX-REC", kind: "recovery", refrigerant: "R407C", waterCapacityKg: 26, tareKg: 14 }),
    "cylinder",
  ).cylinder.id;
  ok(
    await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg: 1, circuit: 1, cylinderId }),
    "movement",
  );
  const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#88aacc" } })
    .png()
    .toBuffer();
  const photoId = ok(await technician.post(`/api/visits/${visitId}/photos`).attach("photo", png, "plate.png"), "photo")
    .photo.id;
  const evacuationId = ok(
    await technician.post(`/api/visits/${visitId}/evacuations`).send({ samples: [{ minutes: 0, microns: 5000 }] }),
    "evacuation",
  ).evacuation.id;
  const invitationId = ok(
    await owner.post("/api/invitations").send({ email: "matrix-invitee@bellbird.example", role: "apprentice" }),
    "invitation",
  ).invitation.id;
  const caseId = ok(await senior.post("/api/cases").send(CASE_DRAFT), "case").case.id;
  ok(await senior.post(`/api/cases/${caseId}/publish`).set("If-Match", '"1"'), "publish");
  const attemptId = ok(
    await apprentice.post("/api/attempts").send({
      caseId,
      answers: CASE_ANSWERS,
    }),
    "attempt",
  ).attempt.id;

  return {
    bellbird,
    coldfront,
    userIds,
    records: {
      visitId,
      equipmentId: unit.id,
      customerId,
      siteId,
      cylinderId,
      photoId,
      evacuationId,
      readingId,
      memberId: userIds["tech2@bellbird.example"]!,
      invitationId,
      caseId,
      attemptId,
    },
  };
}

/** Fills a route's path parameters with the Bellbird record each one names. */
export function pathFor(path: string, records: BellbirdRecords): string {
  const byResource: Record<string, string> = {
    visits: records.visitId,
    equipment: records.equipmentId,
    cylinders: records.cylinderId,
    photos: records.photoId,
    members: records.memberId,
    invitations: records.invitationId,
    cases: records.caseId,
    attempts: records.attemptId,
  };
  const segments = path.split("/");
  return segments
    .map((segment, index) => {
      if (segment === ":evacuationId") return records.evacuationId;
      // A reclaim line that does not exist: the void route must still check who may call it.
      if (segment === ":movementId") return "00000000-0000-4000-8000-00000000beef";
      if (segment === ":circuit") return "1";
      if (segment.startsWith(":")) {
        const id = byResource[segments[index - 1]!];
        if (!id) throw new Error(`No record for ${segment} in ${path}`);
        return id;
      }
      return segment;
    })
    .join("/");
}
