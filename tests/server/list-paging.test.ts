import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { listEquipmentPage } from "@server/db/equipment.ts";
import { analyzeTables } from "@server/db/planner-statistics.ts";
import { listVisitPage } from "@server/db/visits.ts";
import { matchesSearch, searchTerms } from "@shared/format/search-terms.ts";
import { EquipmentListQuerySchema, VisitListQuerySchema } from "@shared/schemas/list-pages.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface Summary {
  id: string;
  startedAt: string;
  equipmentName: string;
  status: string;
  reason: string;
  siteName: string;
  customerName: string;
  refrigerant: string;
}
interface Unit {
  id: string;
  name: string;
  kind: string;
  refrigerant: string;
  circuits: { factoryChargeKg: number }[];
}

/** Grown visits share their start time in fives, so the id must break every tie. */
const GROWN_VISITS = 3000;
const GROWN_UNITS = 240;

/** Follows nextCursor from the first page to the last, and returns every row with the page count. */
async function walk<Row>(agent: Agent, url: string, key: "visits" | "equipment") {
  const rows: Row[] = [];
  let pages = 0;
  let cursor: string | null = null;
  do {
    const separator = url.includes("?") ? "&" : "?";
    const response = await agent.get(cursor ? `${url}${separator}cursor=${cursor}` : url);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    rows.push(...(response.body[key] as Row[]));
    cursor = response.body.nextCursor as string | null;
    pages += 1;
  } while (cursor !== null && pages < 1000);
  return { rows, pages };
}

describe("paged lists: GET /api/visits and GET /api/equipment", () => {
  let testApp: TestApp;
  let technician: Agent;
  let outsider: Agent;
  let organisationId: string;
  let technicianId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    const ids = await seedBellbird(testApp);
    technicianId = ids[BELLBIRD.technician];
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
    const { query, db } = testApp.database;
    organisationId = (
      await query<{ organisation_id: string }>("select organisation_id from users where email = $1", [
        BELLBIRD.technician,
      ])
    )[0]!.organisation_id;
    const site = (
      await query<{ id: string }>("select id from sites where organisation_id = $1 limit 1", [organisationId])
    )[0]!.id;
    // Units with repeated names (ties on the name sort) and charges from 0.5 to 12.4 kg.
    await query(
      `insert into equipment (organisation_id, site_id, name, kind, refrigerant, circuits)
       select $1, $2, 'Grown unit ' || (g % 60), (array['wall split','cool room','packaged rooftop'])[1 + g % 3], (array['R32','R410A','R-404A'])[1 + g % 3],
              jsonb_build_array(jsonb_build_object('number', 1, 'factoryChargeKg', 0.5 + (g % 120) / 10.0, 'meteringDevice', 'txv', 'targetSuperheatK', null, 'targetSubcoolingK', null, 'liquidLineLengthM', null))
       from generate_series(1, ${GROWN_UNITS}) g`,
      [organisationId, site],
    );
    await query(
      `insert into visits (organisation_id, equipment_id, reason, status, started_at)
       select $1, units.ids[1 + g % array_length(units.ids, 1)], 'Grown visit ' || g,
              (array['open','awaiting-review','signed-off','sent-back','signed-off','signed-off'])[1 + g % 6],
              timestamptz '2025-01-01 00:00:00.123456+00' + (g / 5) * interval '1 hour'
       from generate_series(1, ${GROWN_VISITS}) g, (select array_agg(id) as ids from equipment where organisation_id = $1) units`,
      [organisationId],
    );
    await analyzeTables(db);
  });
  afterAll(() => testApp.close());

  const visitCount = async (where = "true", params: unknown[] = []) =>
    (
      await testApp.database.query<{ n: number }>(
        `select count(*)::int as n from visits where organisation_id = $1 and ${where}`,
        [organisationId, ...params],
      )
    )[0]!.n;

  it("walks every visit once, newest first, with ties on the start time broken by id", async () => {
    const { rows, pages } = await walk<Summary>(technician, "/api/visits?limit=173", "visits");
    const total = await visitCount();
    expect(total).toBeGreaterThan(GROWN_VISITS);
    expect(rows).toHaveLength(total);
    expect(new Set(rows.map((row) => row.id)).size).toBe(total);
    expect(pages).toBe(Math.ceil(total / 173));
    for (let index = 1; index < rows.length; index += 1)
      expect(Date.parse(rows[index - 1]!.startedAt)).toBeGreaterThanOrEqual(Date.parse(rows[index]!.startedAt));
  });

  it("gives the default page of 50 and a cursor, and the last page a null cursor", async () => {
    const first = await technician.get("/api/visits");
    expect(first.body.visits).toHaveLength(50);
    expect(typeof first.body.nextCursor).toBe("string");
    const last = await technician.get(
      "/api/visits?status=open&equipmentId=" +
        (first.body.visits[0] as Summary & { equipmentId: string }).equipmentId +
        "&limit=200",
    );
    expect(last.body.nextCursor).toBeNull();
  });

  it("filters by several statuses and sorts by unit name, A to Z, without a gap or a repeat", async () => {
    const { rows } = await walk<Summary>(
      technician,
      "/api/visits?status=open,sent-back&sort=equipmentName&limit=61",
      "visits",
    );
    expect(rows).toHaveLength(await visitCount("status in ('open', 'sent-back')"));
    expect(new Set(rows.map((row) => row.id)).size).toBe(rows.length);
    expect(rows.every((row) => row.status === "open" || row.status === "sent-back")).toBe(true);
    const names = rows.map((row) => row.equipmentName.toLowerCase());
    expect(names).toEqual([...names].sort());
  });

  it("walks backwards too (oldest first) and by status", async () => {
    const oldest = await walk<Summary>(technician, "/api/visits?dir=asc&limit=199", "visits");
    const newest = await walk<Summary>(technician, "/api/visits?limit=199", "visits");
    expect(oldest.rows.map((row) => row.id)).toEqual(newest.rows.map((row) => row.id).reverse());
    const byStatus = await walk<Summary>(technician, "/api/visits?sort=status&dir=desc&limit=200", "visits");
    expect(new Set(byStatus.rows.map((row) => row.id)).size).toBe(await visitCount());
  });

  it("searches unit, site, customer, refrigerant and reason word by word, however the refrigerant is written", async () => {
    // Every word anywhere: "visit" in the reason, "1777" in the one grown reason that holds it.
    const one = await walk<Summary>(technician, "/api/visits?q=VISIT%201777&limit=200", "visits");
    expect(one.rows.map((row) => row.reason)).toEqual(["Grown visit 1777"]);
    const grown = await walk<Summary>(technician, "/api/visits?q=grown%20visit&limit=200", "visits");
    expect(grown.rows).toHaveLength(GROWN_VISITS);
    for (const typed of ["r-404a", "404A", "R404A"]) {
      const found = await walk<Summary>(technician, `/api/visits?q=${typed}&limit=200`, "visits");
      expect(found.rows.length, typed).toBeGreaterThan(0);
      expect(
        found.rows.every((row) => row.refrigerant.replace("-", "") === "R404A"),
        typed,
      ).toBe(true);
    }
    const clinic = await technician.get("/api/visits?q=wattle%20nothing-like-this");
    expect(clinic.body.visits).toEqual([]);
    // % and _ are plain characters, not patterns.
    expect((await technician.get("/api/visits?q=%25")).body.visits).toEqual([]);
  });

  it("finds exactly what the client's search rule finds, whether it reads ids from the index or walks the list", async () => {
    const all = (
      await walk<Summary & { technicians: { name: string }[] }>(technician, "/api/visits?limit=200", "visits")
    ).rows;
    const textOf = (visit: Summary) =>
      [visit.equipmentName, visit.siteName, visit.customerName, visit.refrigerant, visit.reason]
        .join(" ")
        .toLowerCase();
    // "grown" finds more visits than SEARCH_BY_ID_LIMIT (row by row); the others fewer (by id).
    for (const query of [
      "grown",
      "grown visit 17",
      "R-32 toko",
      "wattle clinic",
      "17",
      "zzqx",
      "visit 1_",
      "50%",
      "rooftop -",
    ]) {
      const expected = all
        .filter((visit) =>
          searchTerms(query).every(
            (term) =>
              matchesSearch(textOf(visit), term.word) ||
              visit.technicians.some((person) => person.name.toLowerCase().includes(term.word)),
          ),
        )
        .map((visit) => visit.id)
        .sort();
      const found = (
        await walk<Summary>(technician, `/api/visits?q=${encodeURIComponent(query)}&limit=200`, "visits")
      ).rows
        .map((visit) => visit.id)
        .sort();
      expect(found, query).toEqual(expected);
    }
  });

  it("lists the visits the asker is on the crew of, with their last activity", async () => {
    const { rows } = await walk<Summary & { technicians: { id: string }[]; yourLastActivityAt: string | null }>(
      technician,
      "/api/visits?crew=me&limit=200",
      "visits",
    );
    const onCrew = (
      await testApp.database.query<{ n: number }>(
        "select count(*)::int as n from visit_technicians where user_id = $1",
        [technicianId],
      )
    )[0]!.n;
    expect(onCrew).toBeGreaterThan(0);
    expect(rows).toHaveLength(onCrew);
    expect(rows.every((row) => row.technicians.some((person) => person.id === technicianId))).toBe(true);
    // A crew member's name finds their visits, as the jobs search did on the client.
    const byName = await walk<Summary>(technician, "/api/visits?q=TOKO&limit=200", "visits");
    expect(byName.rows.map((row) => row.id).sort()).toEqual(rows.map((row) => row.id).sort());
  });

  it("refuses a bad cursor, limit, sort or status with a clear 400", async () => {
    const forged = await technician.get("/api/visits?cursor=not-a-cursor");
    expect(forged.status).toBe(400);
    expect(forged.body.message).toMatch(/cursor/i);
    const wrongShape = Buffer.from(
      JSON.stringify({ s: "startedAt", d: "desc", v: ["yesterday"], id: "00000000-0000-4000-8000-000000000000" }),
    ).toString("base64url");
    expect((await technician.get(`/api/visits?cursor=${wrongShape}`)).status).toBe(400);
    const byDate = (await technician.get("/api/visits?limit=5")).body.nextCursor as string;
    const otherSort = await technician.get(`/api/visits?sort=reason&cursor=${byDate}`);
    expect(otherSort.status).toBe(400);
    expect(otherSort.body.message).toMatch(/another sort/);
    for (const [query, field] of [
      ["limit=0", "limit"],
      ["limit=201", "limit"],
      ["limit=ten", "limit"],
      ["sort=crew", "sort"],
      ["status=closed", "status"],
      ["dir=up", "dir"],
    ] as const) {
      const response = await technician.get(`/api/visits?${query}`);
      expect(response.status, query).toBe(400);
      expect(Object.keys(response.body.fields ?? {}).join(), query).toContain(field);
    }
    expect((await technician.get("/api/equipment?cursor=" + byDate)).status).toBe(400);
    expect((await technician.get("/api/equipment?kind=spaceship")).status).toBe(400);
  });

  it("keeps the search text up to date when a visit is started or its unit, site or customer is renamed", async () => {
    const { query } = testApp.database;
    const unit = (
      await query<{ id: string; site_id: string }>(
        "select id, site_id from equipment where organisation_id = $1 and name = 'Grown unit 7' limit 1",
        [organisationId],
      )
    )[0]!;
    const started = await technician.post("/api/visits").send({ equipmentId: unit.id, reason: "Quokka inspection" });
    expect(started.status).toBe(201);
    expect((await technician.get("/api/visits?q=quokka")).body.visits.map((visit: Summary) => visit.id)).toEqual([
      started.body.visit.id,
    ]);

    await query("update equipment set name = 'Numbat chiller' where id = $1", [unit.id]);
    const renamedUnit = (await walk<Summary>(technician, "/api/visits?q=numbat&limit=200", "visits")).rows;
    expect(renamedUnit.length).toBe(await visitCount("equipment_id = $2", [unit.id]));
    expect((await technician.get("/api/equipment?q=numbat")).body.equipment.map((row: Unit) => row.id)).toEqual([
      unit.id,
    ]);

    await query("update sites set name = 'Bilby Depot' where id = $1", [unit.site_id]);
    await query(
      "update customers set name = 'Dunnart Holdings' where id = (select customer_id from sites where id = $1)",
      [unit.site_id],
    );
    for (const query of ["bilby depot", "dunnart", "numbat bilby dunnart quokka"]) {
      const found = (await walk<Summary>(technician, `/api/visits?q=${encodeURIComponent(query)}&limit=200`, "visits"))
        .rows;
      expect(found.length, query).toBeGreaterThan(0);
      expect(
        found.every((visit) => visit.siteName === "Bilby Depot" && visit.customerName === "Dunnart Holdings"),
        query,
      ).toBe(true);
    }
    expect((await technician.get("/api/equipment?q=dunnart%20numbat")).body.equipment).toHaveLength(1);
    // The place sort's own copies of the names follow the renames (the same trigger as the search text).
    const sortNames = (
      await query<{ site_sort_name: string; customer_sort_name: string }>(
        "select site_sort_name, customer_sort_name from equipment where id = $1",
        [unit.id],
      )
    )[0];
    expect(sortNames).toEqual({ site_sort_name: "bilby depot", customer_sort_name: "dunnart holdings" });
    expect((await technician.get("/api/visits?q=grown%20unit%207%20quokka")).body.visits).toEqual([]);
  });

  it("never shows another organisation's rows, whatever it asks", async () => {
    expect((await outsider.get("/api/visits?limit=200")).body).toEqual({ visits: [], nextCursor: null });
    expect((await outsider.get("/api/visits?q=grown")).body.visits).toEqual([]);
    expect((await outsider.get("/api/equipment?q=grown")).body).toEqual({ equipment: [], nextCursor: null });
    // A cursor is a position in an order, not a key: Bellbird's cursor shows the outsider nothing.
    const cursor = (await technician.get("/api/visits?limit=5")).body.nextCursor as string;
    expect((await outsider.get(`/api/visits?cursor=${cursor}`)).body.visits).toEqual([]);
  });

  it("walks the equipment in each sort without a gap or a repeat, and searches and filters by kind", async () => {
    const total = (
      await testApp.database.query<{ n: number }>(
        "select count(*)::int as n from equipment where organisation_id = $1 and not archived",
        [organisationId],
      )
    )[0]!.n;
    for (const sort of ["name", "kind", "place", "refrigerant", "circuits", "factoryCharge"]) {
      for (const dir of ["asc", "desc"]) {
        const { rows } = await walk<Unit>(technician, `/api/equipment?sort=${sort}&dir=${dir}&limit=37`, "equipment");
        expect(rows, `${sort} ${dir}`).toHaveLength(total);
        expect(new Set(rows.map((row) => row.id)).size, `${sort} ${dir}`).toBe(total);
      }
    }
    const { rows: byCharge } = await walk<Unit>(technician, "/api/equipment?sort=factoryCharge&limit=50", "equipment");
    const charges = byCharge.map((unit) => unit.circuits.reduce((sum, circuit) => sum + circuit.factoryChargeKg, 0));
    expect(charges).toEqual([...charges].sort((a, b) => a - b));
    const { rows: r32 } = await walk<Unit>(
      technician,
      "/api/equipment?q=r-32&kind=wall%20split&limit=200",
      "equipment",
    );
    expect(r32.length).toBeGreaterThan(0);
    expect(r32.every((unit) => unit.refrigerant === "R32" && unit.kind === "wall split")).toBe(true);
    // "404a" finds the units whose refrigerant was stored as R-404A.
    const { rows: dashed } = await walk<Unit>(technician, "/api/equipment?q=404a&limit=200", "equipment");
    expect(dashed.some((unit) => unit.refrigerant === "R-404A")).toBe(true);
    expect((await technician.get("/api/equipment")).body.equipment).toHaveLength(50);
  });

  it("reads the newest visits through the (organisation_id, started_at) index, first page and deep", async () => {
    // The queries the list sends, captured through a logger and explained as they ran.
    const captured: { query: string; params: unknown[] }[] = [];
    const db = testApp.database.withQueryLog((query, params) => void captured.push({ query, params }));
    const first = await listVisitPage(db, organisationId, VisitListQuerySchema.parse({ limit: "50" }), technicianId);
    const deep = await listVisitPage(
      db,
      organisationId,
      VisitListQuerySchema.parse({ limit: "50", cursor: first.nextCursor! }),
      technicianId,
    );
    expect(deep.visits[0]!.id).not.toBe(first.visits[0]!.id);
    const listQueries = captured.filter(
      (entry) => entry.query.includes('from "visits"') && entry.query.includes("limit"),
    );
    expect(listQueries).toHaveLength(2);
    for (const entry of listQueries) {
      const plan = (await testApp.database.query<{ "QUERY PLAN": string }>(`explain ${entry.query}`, entry.params))
        .map((row) => row["QUERY PLAN"])
        .join("\n");
      expect(plan).toContain("visits_organisation_started_idx");
      expect(plan).not.toMatch(/Seq Scan on visits/);
    }
    // Counts, crew and activity ask about the page's ids only (the activity query names them in each of its four parts).
    const inLists = captured.filter((entry) => !listQueries.includes(entry)).map((entry) => entry.params.length);
    expect(Math.max(...inLists)).toBeLessThanOrEqual(4 * (50 + 2));
    // The equipment list by name reads in index order with the index proposed for it (not yet a
    // migration: made here if missing); without it the organisation's units are read and sorted.
    await testApp.database.query(
      "create index if not exists equipment_organisation_name_idx on equipment (organisation_id, lower(name), id) where not archived",
    );
    await testApp.database.query("analyze equipment");
    captured.length = 0;
    await listEquipmentPage(db, organisationId, EquipmentListQuerySchema.parse({}));
    expect(captured).toHaveLength(1);
    const plan = (
      await testApp.database.query<{ "QUERY PLAN": string }>(`explain ${captured[0]!.query}`, captured[0]!.params)
    )
      .map((row) => row["QUERY PLAN"])
      .join("\n");
    if (process.env.SHOW_PLANS) console.info(plan);
    expect(plan).toContain("equipment_organisation_name_idx");
    expect(plan).not.toMatch(/Seq Scan on equipment/);
  });

  it("reads one status's newest visits and the units by place in index order, not every row", async () => {
    const captured: { query: string; params: unknown[] }[] = [];
    const db = testApp.database.withQueryLog((query, params) => void captured.push({ query, params }));
    await analyzeTables(testApp.database.db);
    const planOf = async (entry: { query: string; params: unknown[] }) =>
      (await testApp.database.query<{ "QUERY PLAN": string }>(`explain ${entry.query}`, entry.params))
        .map((row) => row["QUERY PLAN"])
        .join("\n");
    await listVisitPage(
      db,
      organisationId,
      VisitListQuerySchema.parse({ status: "sent-back", limit: "20" }),
      technicianId,
    );
    const statusPlan = await planOf(
      captured.find((entry) => entry.query.includes('from "visits"') && entry.query.includes("limit"))!,
    );
    expect(statusPlan).toContain("visits_organisation_status_started_idx");
    captured.length = 0;
    await listEquipmentPage(db, organisationId, EquipmentListQuerySchema.parse({ sort: "place", limit: "20" }));
    const placePlan = await planOf(captured[0]!);
    expect(placePlan).toContain("equipment_organisation_place_idx");
    expect(placePlan).not.toMatch(/Seq Scan on equipment/);
  });
});
