import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { licenceNumbers } from "@server/db/licence-numbers.ts";
import { registerChunks, registerMovements } from "@server/db/register.ts";
import { registerCsv, registerCsvLine } from "@server/register/register-csv.ts";
import { EXPORT_CHUNK_LINES, registerCsvText } from "@server/register/register-csv-text.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface Line {
  id: string;
  at: string;
  kg: number;
  kind: string;
  refrigerant: string;
  technician: { id: string; name: string } | null;
}
interface Total {
  refrigerant: string;
  kind: string;
  kg: number;
}

/** More lines than one export chunk, so the streamed CSV is written in several pieces. */
const GROWN_LINES = EXPORT_CHUNK_LINES + 230;

/** Follows nextCursor from the first page to the last; returns every line, the pages and each page's totals. */
async function walk(agent: Agent, url: string) {
  const lines: Line[] = [];
  const totals: Total[][] = [];
  let pages = 0;
  let cursor: string | null = null;
  do {
    const separator = url.includes("?") ? "&" : "?";
    const response = await agent.get(cursor ? `${url}${separator}cursor=${cursor}` : url);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    lines.push(...(response.body.movements as Line[]));
    totals.push(response.body.totals as Total[]);
    cursor = response.body.nextCursor as string | null;
    pages += 1;
  } while (cursor !== null && pages < 1000);
  return { lines, pages, totals };
}

/** Kilograms by refrigerant and kind, summed here from the lines (grams, the scale's resolution). */
function totalsOf(lines: readonly Line[]): Total[] {
  const sums = new Map<string, Total>();
  for (const line of lines) {
    const key = `${line.refrigerant} ${line.kind}`;
    const total = sums.get(key) ?? { refrigerant: line.refrigerant, kind: line.kind, kg: 0 };
    total.kg = Math.round((total.kg + line.kg) * 1000) / 1000;
    sums.set(key, total);
  }
  return [...sums.values()];
}

describe("register paging: GET /api/register and its CSV export", () => {
  let testApp: TestApp;
  let owner: Agent;
  let technician: Agent;
  let people: Record<string, string>;
  let organisationId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    people = await seedBellbird(testApp);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const { query } = testApp.database;
    organisationId = (
      await query<{ organisation_id: string }>("select organisation_id from users where email = $1", [BELLBIRD.owner])
    )[0]!.organisation_id;
    const unit = (
      await query<{ id: string; refrigerant: string }>(
        "select id, refrigerant from equipment where organisation_id = $1 order by name limit 1",
        [organisationId],
      )
    )[0]!;
    // Lines in threes on the same minute (ties on the date), by the technician and the senior in
    // turn, every seventh one voided; two refrigerants, three kinds, grams that add up unevenly.
    await query(
      `insert into refrigerant_movements (organisation_id, equipment_id, circuit, refrigerant, kind, kg, technician_id, at, voided_at, void_reason)
       select $1, $2, 1, (array['R407C','R32'])[1 + g % 2], (array['recovered','added-new','reused'])[1 + g % 3], 0.013 + (g % 40) / 10.0,
              case when g % 2 = 0 then $3::uuid else $4::uuid end,
              timestamptz '2025-03-01 00:00:00+00' + (g / 3) * interval '1 minute',
              case when g % 7 = 0 then now() end, case when g % 7 = 0 then 'Typed twice' end
       from generate_series(1, ${GROWN_LINES}) g`,
      [organisationId, unit.id, people[BELLBIRD.technician], people[BELLBIRD.senior]],
    );
  });
  afterAll(() => testApp.close());

  const standingLines = async (where = "true", params: unknown[] = []) =>
    (
      await testApp.database.query<{ n: number }>(
        `select count(*)::int as n from refrigerant_movements where organisation_id = $1 and voided_at is null and ${where}`,
        [organisationId, ...params],
      )
    )[0]!.n;

  it("walks every standing line once, oldest first, with ties on the date kept in a stable order", async () => {
    const { lines, pages } = await walk(owner, "/api/register?limit=37");
    const total = await standingLines();
    expect(total).toBeGreaterThan(EXPORT_CHUNK_LINES);
    expect(lines).toHaveLength(total);
    expect(new Set(lines.map((line) => line.id)).size).toBe(total);
    expect(pages).toBe(Math.ceil(total / 37));
    for (let index = 1; index < lines.length; index += 1)
      expect(Date.parse(lines[index - 1]!.at)).toBeLessThanOrEqual(Date.parse(lines[index]!.at));
    // The whole register read at once has the same lines in the same order.
    const whole = await registerMovements(testApp.database.db, organisationId, {});
    expect(lines.map((line) => line.id)).toEqual(whole.map((line) => line.id));
  });

  it("walks newest first on asking, the same lines in reverse", async () => {
    const oldestFirst = (await walk(owner, "/api/register?limit=200")).lines.map((line) => line.id);
    const newestFirst = (await walk(owner, "/api/register?limit=200&dir=desc")).lines.map((line) => line.id);
    expect(newestFirst).toEqual([...oldestFirst].reverse());
  });

  it("gives the totals of every line of the period on every page, not of the page", async () => {
    const { lines, totals } = await walk(owner, "/api/register?limit=50");
    expect(totals.length).toBeGreaterThan(2);
    const expected = totalsOf(lines);
    for (const pageTotals of totals)
      expect(pageTotals).toEqual(
        expect.arrayContaining(
          expected.map((total) => expect.objectContaining({ ...total, kg: expect.closeTo(total.kg, 6) })),
        ),
      );
    for (const pageTotals of totals) expect(pageTotals).toHaveLength(expected.length);
  });

  it("filters by period and technician in the database, totals included", async () => {
    const march = await walk(owner, "/api/register?from=2025-03-01&to=2025-03-01&limit=100");
    expect(march.lines).toHaveLength(await standingLines("at >= '2025-03-01' and at < '2025-03-02'"));
    expect(march.lines.every((line) => line.at.startsWith("2025-03-01"))).toBe(true);
    expect(march.totals[0]).toEqual(
      expect.arrayContaining(
        totalsOf(march.lines).map((total) => expect.objectContaining({ ...total, kg: expect.closeTo(total.kg, 6) })),
      ),
    );

    // A technician reads their own lines only, and their totals are of their lines.
    const own = await walk(technician, "/api/register?limit=200");
    expect(own.lines).toHaveLength(await standingLines("technician_id = $2", [people[BELLBIRD.technician]]));
    expect(own.lines.every((line) => line.technician?.id === people[BELLBIRD.technician])).toBe(true);
    expect(own.totals[0]).toHaveLength(totalsOf(own.lines).length);
  });

  it("refuses a cursor it did not give out, or one of the other direction", async () => {
    expect((await owner.get("/api/register?cursor=not-a-cursor")).status).toBe(400);
    const first = await owner.get("/api/register?limit=10");
    const wrongWay = await owner.get(`/api/register?limit=10&dir=desc&cursor=${first.body.nextCursor}`);
    expect(wrongWay.status).toBe(400);
    expect(wrongWay.body.fields.cursor).toBeDefined();
    expect((await owner.get("/api/register?limit=0")).status).toBe(400);
  });

  it("streams the CSV export with the same text the whole register makes at once", async () => {
    const { db } = testApp.database;
    const licences = await licenceNumbers(db, organisationId);
    const whole = registerCsv(await registerMovements(db, organisationId, {}), licences);
    const response = await owner.get("/api/register/export.csv");
    expect(response.status).toBe(200);
    expect(response.text).toBe(whole);
    expect(response.text.split("\r\n").length - 2).toBe(await standingLines());

    // In small chunks too: the pieces join into the same text.
    let pieces = 0;
    let text = "";
    for await (const piece of registerCsvText(registerChunks(db, organisationId, {}, 7), (movement) =>
      registerCsvLine(movement, licences),
    )) {
      pieces += 1;
      text += piece;
    }
    // The header on its own (it leaves before any line is read), then a piece per chunk.
    expect(pieces).toBe(1 + Math.ceil((await standingLines()) / 7));
    expect(text).toBe(whole);
  });

  // Compressed, the export is still the whole register (each piece is flushed through the
  // compression: tests/server/http/stream-pieces.test.ts).
  it("sends the same text compressed", async () => {
    const whole = registerCsv(
      await registerMovements(testApp.database.db, organisationId, {}),
      await licenceNumbers(testApp.database.db, organisationId),
    );
    const response = await owner.get("/api/register/export.csv").set("Accept-Encoding", "gzip");
    expect(response.headers["content-encoding"]).toBe("gzip");
    expect(response.text).toBe(whole);
  });
});
