import { eq } from "drizzle-orm";
import type { Express } from "express";
import type { Role } from "@shared/schemas/auth.ts";
import request from "supertest";
import { users } from "@server/db/schema.ts";
import { DEMO_PASSWORD, demoPeople, type DemoEmail } from "@server/db/seed/demo-scenario.ts";
import { oneRow } from "@server/db/one-row.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import type { TestApp } from "./test-app.ts";

export const BELLBIRD = {
  owner: "owner@bellbird.example",
  senior: "senior@bellbird.example",
  technician: "tech@bellbird.example",
  apprentice: "apprentice@bellbird.example",
} as const;

/** A supertest agent (keeps cookies) signed in with the given credentials. */
export async function signedIn(app: Express, email: string, password = DEMO_PASSWORD) {
  const agent = request.agent(app);
  const response = await agent.post("/api/auth/sign-in").send({ email, password });
  if (response.status !== 200)
    throw new Error(`sign-in as ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return agent;
}

/** One signed-in agent per role of Bellbird, the demo company. */
export async function signedInBellbird(app: Express): Promise<Record<Role, Awaited<ReturnType<typeof signedIn>>>> {
  return {
    owner: await signedIn(app, BELLBIRD.owner),
    senior: await signedIn(app, BELLBIRD.senior),
    technician: await signedIn(app, BELLBIRD.technician),
    apprentice: await signedIn(app, BELLBIRD.apprentice),
  };
}

/**
 * Loads the Bellbird demo company and returns each demo person's user id by e-mail. The register
 * tests count lines from an empty register, so the demo's charge history (which writes register
 * lines) is left out unless a test asks for it.
 */
export async function seedBellbird(
  testApp: TestApp,
  { withChargeHistory = false } = {},
): Promise<Record<DemoEmail, string>> {
  await seedDemoData(testApp.database.db, { withChargeHistory });
  const ids: Partial<Record<DemoEmail, string>> = {};
  for (const person of demoPeople) {
    const rows = await testApp.database.db.select({ id: users.id }).from(users).where(eq(users.email, person.email));
    ids[person.email] = oneRow(rows, `the demo person ${person.email}`).id;
  }
  return ids as Record<DemoEmail, string>;
}

/** Each demo person's user id by e-mail, as seedBellbird returns them. */
export type DemoIds = Record<DemoEmail, string>;

/** A second, unrelated company with its own owner, signed in. */
export async function signUpOtherCompany(app: Express, email = "owner@coldfront.example") {
  const agent = request.agent(app);
  const response = await agent
    .post("/api/auth/sign-up")
    .send({ name: "Alex Marr", email, password: "frosty-coil-44-north", organisationName: "Coldfront Refrigeration" });
  if (response.status !== 201) throw new Error(`sign-up failed: ${response.status} ${JSON.stringify(response.body)}`);
  return { agent, user: response.body.user as { id: string; organisationId: string } };
}

/**
 * The arrangement of most API tests: Bellbird loaded (without its charge history), each of its
 * roles signed in, and the owner of another company signed in to show what an outsider cannot reach.
 */
export async function bellbirdAndOutsider(testApp: TestApp) {
  const ids = await seedBellbird(testApp);
  const agents = await signedInBellbird(testApp.app);
  const outsider = (await signUpOtherCompany(testApp.app)).agent;
  return { ids, ...agents, outsider };
}

/** The first URL in a caught mail (decoded text). */
export function linkIn(decodedMail: string): URL {
  const match = decodedMail.match(/https?:\/\/[^\s"<>]+/);
  if (!match) throw new Error("no link in the mail");
  return new URL(match[0]);
}

export function cookieHeader(response: request.Response): string[] {
  const header = response.headers["set-cookie"] as unknown;
  return Array.isArray(header) ? (header as string[]) : typeof header === "string" ? [header] : [];
}
