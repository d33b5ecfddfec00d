import type { signedIn } from "./demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/**
 * The demo company's units by the refrigerant that tells them apart (server/db/seed/demo-scenario.ts):
 * the R407C rooftop unit RTU-1 and the R32 wall split. Tests find them through the API, as a
 * screen does, rather than by ids the seed happens to make.
 */
export async function demoUnitIds(agent: Agent): Promise<{ rooftop: string; split: string }> {
  const units = (await agent.get("/api/equipment")).body.equipment as { id: string; refrigerant: string }[];
  const idOf = (refrigerant: string) => {
    const unit = units.find((candidate) => candidate.refrigerant === refrigerant);
    if (!unit) throw new Error(`the demo has no ${refrigerant} unit`);
    return unit.id;
  };
  return { rooftop: idOf("R407C"), split: idOf("R32") };
}

/** Starts a visit on a unit as `agent`. @returns the visit's id */
export async function openVisit(agent: Agent, equipmentId: string, reason: string): Promise<string> {
  return (await agent.post("/api/visits").send({ equipmentId, reason })).body.visit.id as string;
}
