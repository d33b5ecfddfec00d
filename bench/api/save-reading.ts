/**
 * Saving a reading under concurrent technicians (issue 16): POST /api/visits/:id/readings on the
 * real server (bench/api/server-process.ts), closed loop through the bench's one load client
 * (bench/api/load.ts) at 1, 10 and 50 connections, each save going to the next of several open
 * visits as a crew spread over jobs would send them. Besides the latencies it reads the server's
 * own CPU time per save: steadier than the latencies on a shared machine, where they mostly
 * measure the other jobs, and the figure that bounds the throughput of one process (a save's
 * work, PGlite's included, runs on the server's one thread).
 */
import { runLoadAcross, type LoadResult } from "./load.ts";
import type { BenchServer } from "./server-process.ts";

export const SAVE_CONNECTIONS = [1, 10, 50] as const;

/** POST /api/visits/:id/readings: a reading a technician types on an R407C unit. */
export const READING_BODY = {
  circuit: 1,
  suctionPressureKPa: 468,
  suctionLineTempC: 12.1,
  liquidPressureKPa: 1685,
  liquidLineTempC: 37,
  dischargeLineTempC: 82,
  returnAirDryBulbC: 24.5,
  returnAirWetBulbC: 17.8,
  supplyAirDryBulbC: 13.6,
  outdoorAirDryBulbC: 30.2,
  runMinutes: 20,
};

export interface SaveLevel {
  connections: number;
  result: LoadResult;
  /** The server's CPU time (user + system) per answered save, ms. */
  serverCpuMs: number;
}

/**
 * Open visits to save to on a database without a prepared list (the demo company): visits opened
 * through the API on its R407C units (READING_BODY's refrigerant), `count` in all.
 */
export async function openVisitsForSaving(server: BenchServer, cookie: string, count: number): Promise<string[]> {
  const headers = { cookie, origin: server.appUrl, "content-type": "application/json" };
  const page = (await (await fetch(`${server.origin}/api/equipment?q=R407C`, { headers })).json()) as {
    equipment: { id: string; refrigerant: string }[];
  };
  const units = page.equipment.filter((unit) => unit.refrigerant === "R407C");
  if (units.length === 0) throw new Error("no R407C unit to open visits on");
  const visits: string[] = [];
  for (let index = 0; index < count; index++) {
    const response = await fetch(`${server.origin}/api/visits`, {
      method: "POST",
      headers,
      body: JSON.stringify({ equipmentId: units[index % units.length]!.id, reason: "Load test: quarterly check" }),
    });
    if (response.status !== 201)
      throw new Error(`opening a visit answered ${response.status}: ${await response.text()}`);
    visits.push(((await response.json()) as { visit: { id: string } }).visit.id);
  }
  return visits;
}

/**
 * Each level for `seconds`, after a short warm-up (JIT, the planner, the session cache). Given
 * several app servers on one database, each level's connections are spread over them as a load
 * balancer would, and the CPU per save is theirs together.
 */
export async function measureSaving(
  serverOrServers: BenchServer | readonly BenchServer[],
  cookie: string,
  openVisits: readonly string[],
  seconds: number,
  levels: readonly number[] = SAVE_CONNECTIONS,
): Promise<SaveLevel[]> {
  const servers = Array.isArray(serverOrServers) ? serverOrServers : [serverOrServers as BenchServer];
  const body = JSON.stringify(READING_BODY);
  const cpu = async () => {
    const usages = await Promise.all(servers.map((server) => server.cpu()));
    return usages.reduce((sum, usage) => sum + usage.user + usage.system, 0);
  };
  // Each save goes to the next open visit.
  const load = (connections: number, duration: number) =>
    runLoadAcross(
      servers.map((server) => server.origin),
      {
        connections,
        seconds: duration,
        next: (index) => ({
          method: "POST",
          path: `/api/visits/${openVisits[index % openVisits.length]}/readings`,
          headers: { cookie, origin: servers[0]!.appUrl },
          body,
        }),
        expectStatus: [201],
      },
    );
  await load(4, 2);
  const measured: SaveLevel[] = [];
  for (const connections of levels) {
    const before = await cpu();
    const result = await load(connections, seconds);
    const cpuMs = ((await cpu()) - before) / 1000;
    measured.push({ connections, result, serverCpuMs: cpuMs / Math.max(1, result.requests) });
  }
  return measured;
}
