import fc from "fast-check";
import sharp from "sharp";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ROLES, type Role } from "@shared/schemas/auth.ts";
import type { RouteKey } from "@server/auth/route-permissions.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, signedIn } from "../setup/demo-accounts.ts";
import { appRoutes, type AppRoute } from "../setup/route-table.ts";
import { SESSION_ROUTES, UNTHROTTLED, sampleBodies } from "../setup/route-samples.ts";
import { pathFor, twoCompanies, type TwoCompanies } from "../setup/two-companies.ts";

/**
 * Random and broken requests to every route of the app (read from its router stack), as every
 * role and signed out: no answer may be a 5xx, and every error must be a JSON body with a
 * message (README, "Every error is a JSON body with a `message`"). Issue 13 found seven causes
 * of 500 by hand; this keeps new ones from slipping in.
 *
 * Bounded and repeatable: RUNS_PER_ROUTE requests per route and caller (about 3,000 in all),
 * each property seeded from SEED and its position, so a failure replays with the same inputs.
 */
const SEED = 1313;
const RUNS_PER_ROUTE = 8;
type Caller = Role | "signed-out";
const CALLERS: readonly Caller[] = [...ROLES, "signed-out"];

/** Strings that have broken servers: NUL, lone surrogates, control characters, dates out of range, huge and odd numbers in text. */
const NASTY_STRINGS = [
  "",
  " ",
  "\u0000",
  "a\u0000b",
  "\uD800",
  "x\uDFFFy",
  "\uDE00\uD83D",
  "bell\u0007",
  "tab\tand\nnewline",
  "\u0085\u009F",
  "😀❄️",
  "0000-01-01",
  "0000-01-01T00:00:00Z",
  "9999-12-31T23:59:59-14:00",
  "9999-12-31",
  "2026-02-30",
  "99999",
  "1e309",
  "-0",
  "NaN",
  "R744",
  "R410A",
  "gen~1~txv~normal~R744",
  "' or 1=1 --",
  '=HYPERLINK("http://example.com")',
  "<script>alert(1)</script>",
  "../../etc/passwd",
  "x".repeat(5_000),
];
const NASTY_NUMBERS = [0, -0, -1, 0.5, 1.5, 7, 99, 1e6, 1e308, -1e308, 2 ** 31, Number.MAX_SAFE_INTEGER + 2, 5e-324];

const nastyString = fc.oneof(
  { arbitrary: fc.constantFrom(...NASTY_STRINGS), weight: 3 },
  { arbitrary: fc.string({ unit: "binary", maxLength: 40 }), weight: 1 },
);
const nastyLeaf = fc.oneof(
  { arbitrary: nastyString, weight: 4 },
  { arbitrary: fc.constantFrom<unknown>(...NASTY_NUMBERS), weight: 3 },
  { arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }), weight: 1 },
  { arbitrary: fc.constantFrom<unknown>(true, false, null), weight: 1 },
  { arbitrary: fc.uuid(), weight: 1 },
);
const nastyValue: fc.Arbitrary<unknown> = fc.oneof(
  { arbitrary: nastyLeaf, weight: 6 },
  { arbitrary: fc.array(nastyLeaf, { maxLength: 4 }), weight: 1 },
  { arbitrary: fc.dictionary(fc.constantFrom("a", "number", "kind", "minutes"), nastyLeaf, { maxKeys: 3 }), weight: 1 },
);

/** Field names the API's bodies use, so that random objects hit real fields. */
const FIELD_NAMES = [
  "name",
  "email",
  "password",
  "organisationName",
  "token",
  "role",
  "body",
  "reason",
  "note",
  "kind",
  "kg",
  "circuit",
  "cylinderId",
  "at",
  "takenAt",
  "title",
  "story",
  "input",
  "reasoning",
  "refrigerant",
  "meteringDevice",
  "fault",
  "seed",
  "caseId",
  "answers",
  "action",
  "to",
  "label",
  "serial",
  "waterCapacityKg",
  "tareKg",
  "customerId",
  "siteId",
  "equipmentId",
  "address",
  "altitudeM",
  "circuits",
  "microns",
  "minutes",
  "isolateNow",
  "targetMicrons",
  "samples",
  "method",
  "placesChecked",
  "leaks",
  "target",
  "supplyVolts",
  "preferences",
  "readingId",
  "description",
  "amountKg",
  "suctionPressureKPa",
  "liquidPressureKPa",
  "lineAdjustmentKg",
  "evacuationTargetMicrons",
];

type Mutation = [index: number, value: unknown, how: "replace" | "delete" | "add"];

/** Every path to a value inside a JSON value: ["story", "site"], ["circuits", 0, "number"] … */
function pathsOf(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return [prefix];
  const entries = Array.isArray(value) ? value.map((item, index) => [index, item] as const) : Object.entries(value);
  return [prefix, ...entries.flatMap(([key, item]) => pathsOf(item, [...prefix, key]))];
}

/** The sample with one or two fields replaced, removed or added: a bad value in an otherwise valid request. */
function mutate(sample: Record<string, unknown>, mutations: Mutation[]): unknown {
  let body: unknown = structuredClone(sample);
  for (const [index, value, how] of mutations) {
    const paths = pathsOf(body);
    const path = paths[index % paths.length]!;
    if (path.length === 0) {
      body = how === "replace" ? value : body;
      continue;
    }
    const parent = path
      .slice(0, -1)
      .reduce<unknown>((node, key) => (node as Record<string | number, unknown>)[key], body) as Record<
      string | number,
      unknown
    >;
    const key = path.at(-1)!;
    if (how === "replace") parent[key] = value;
    else if (how === "delete") delete parent[key];
    else parent[`${String(key)}Extra`] = value;
  }
  return body;
}

const mutations = fc.array(
  fc.tuple(fc.nat(), nastyValue, fc.constantFrom("replace" as const, "delete" as const, "add" as const)),
  { maxLength: 2 },
);
const randomObject = fc.dictionary(fc.oneof(fc.constantFrom(...FIELD_NAMES), fc.string({ maxLength: 8 })), nastyValue, {
  maxKeys: 6,
});

type Body = { kind: "json"; value: unknown } | { kind: "raw"; text: string } | { kind: "none" };
const rawJson = fc.constantFrom("{", "[1,", '{"name":', "null", '"text"', "12", `{"a":"${"y".repeat(250_000)}"}`);

function bodyFor(sample: Record<string, unknown> | undefined): fc.Arbitrary<Body> {
  const json = (value: fc.Arbitrary<unknown>) => value.map((body): Body => ({ kind: "json", value: body }));
  return fc.oneof(
    { arbitrary: sample ? json(mutations.map((changes) => mutate(sample, changes))) : json(randomObject), weight: 6 },
    { arbitrary: json(randomObject), weight: 2 },
    { arbitrary: json(fc.jsonValue({ maxDepth: 3 })), weight: 1 },
    { arbitrary: rawJson.map((text): Body => ({ kind: "raw", text })), weight: 1 },
    { arbitrary: fc.constant<Body>({ kind: "none" }), weight: 1 },
  );
}

/** Path segments that are not ids: malformed percent-escapes, dots, numbers, another refrigerant's case id. */
const ODD_SEGMENTS = [
  "%",
  "%zz",
  "%00",
  "%ED%A0%80",
  "..",
  "1.5",
  "-1",
  "0",
  "99999999999999999999",
  "abc",
  "gen~1~txv~normal~R744",
  "gen~7~txv~undercharged~R410A",
  "%2F",
  "x".repeat(300),
];

const safeEncode = (text: string) => encodeURIComponent(text.replace(/[\uD800-\uDFFF]/g, "\uFFFD"));
const QUERY_NAMES = ["from", "to", "technicianId", "refrigerant", "status", "equipmentId", "userId", "token"];
const queryArb = fc.option(
  fc.array(
    fc.tuple(
      fc.oneof(fc.constantFrom(...QUERY_NAMES), fc.string({ maxLength: 6 })),
      fc.oneof(nastyString.map(safeEncode), fc.constantFrom("%00", "%ED%A0%80", "%zz", "2026-07-01")),
    ),
    { maxLength: 4 },
  ),
  { nil: undefined },
);

/** A CSV as a logger or a careless hand might write it. */
const CSV_CELLS = [
  "10:05",
  "10:06:30",
  "25:00",
  "99999",
  "2026-03-14T10:05",
  "0000-01-01T00:00:00Z",
  "464",
  "12",
  "1734",
  "37",
  "-5",
  "1e309",
  "abc",
  "",
  '"quoted, cell"',
];
const csvArb = fc
  .tuple(
    fc.shuffledSubarray(
      [
        "Time",
        "Suction pressure kPa",
        "Suction temp C",
        "Liquid pressure kPa",
        "Liquid temp C",
        "DLT",
        "Outdoor C",
        "\u0000odd",
      ],
      { minLength: 0 },
    ),
    fc.array(fc.array(fc.constantFrom(...CSV_CELLS), { maxLength: 8 }), { maxLength: 6 }),
  )
  .map(([header, rows]) => [header.join(","), ...rows.map((row) => row.join(","))].join("\n"));

interface Upload {
  fields: [string, string][];
  file?: { field: string; bytes: Buffer; name: string };
}

describe("API fuzz", () => {
  let testApp: TestApp;
  let world: TwoCompanies;
  let samples: ReturnType<typeof sampleBodies>;
  let photoBytes: Buffer[];
  let total = 0;

  beforeAll(async () => {
    testApp = await createTestApp({ authLimits: UNTHROTTLED });
    world = await twoCompanies(testApp);
    samples = sampleBodies(world.records);
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#3366aa" } })
      .png()
      .toBuffer();
    const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#aa6633" } })
      .jpeg()
      .toBuffer();
    photoBytes = [
      png,
      jpeg,
      png.subarray(0, 60),
      jpeg.subarray(0, jpeg.length - 40),
      Buffer.from("not a photo"),
      Buffer.alloc(0),
    ];
  }, 120_000);
  afterAll(async () => {
    await testApp.close();
  });

  function uploadFor(route: AppRoute): fc.Arbitrary<Upload> | undefined {
    if (route.path.endsWith("/photos")) {
      return fc.record({
        fields: fc.array(
          fc.tuple(
            fc.constantFrom("kind", "caption"),
            fc.oneof(
              fc.constantFrom("gauges", "nameplate", "selfie"),
              nastyString.filter((text) => !text.includes("\u0000")),
            ),
          ),
          { maxLength: 2 },
        ),
        file: fc.option(
          fc.record({
            field: fc.constantFrom("photo", "file"),
            bytes: fc.oneof(
              fc.constantFrom(...photoBytes),
              fc.uint8Array({ maxLength: 300 }).map((bytes) => Buffer.from(bytes)),
            ),
            name: fc.constantFrom("a.png", "b.jpg", "c.txt"),
          }),
          { nil: undefined },
        ),
      });
    }
    if (route.path.endsWith("/readings/import")) {
      return fc.record({
        fields: fc.array(
          fc.tuple(
            fc.constantFrom("circuit", "dayStart", "mode", "mapping"),
            fc.oneof(
              fc.constantFrom(
                "1",
                "2",
                "1.5",
                "2026-12-01T00:00:00+11:00",
                "0000-01-01T00:00:00Z",
                "preview",
                "valid-only",
                "all",
                '{"Time":"takenAt"}',
                "{",
              ),
              nastyString.filter((text) => !text.includes("\u0000")),
            ),
          ),
          { maxLength: 4 },
        ),
        file: fc.option(
          fc.record({
            field: fc.constant("file"),
            bytes: csvArb.map((text) => Buffer.from(text)),
            name: fc.constant("log.csv"),
          }),
          { nil: undefined },
        ),
      });
    }
    return undefined;
  }

  function paramArb(route: AppRoute): fc.Arbitrary<string> {
    const real = pathFor(route.path, world.records);
    const segments = route.path.split("/");
    return fc
      .tuple(
        ...segments.map((segment, index) =>
          segment.startsWith(":")
            ? fc.oneof(fc.constant(real.split("/")[index]!), fc.uuid(), fc.constantFrom(...ODD_SEGMENTS))
            : fc.constant(segment),
        ),
      )
      .map((parts) => parts.join("/"));
  }

  async function agentFor(caller: Caller, route: AppRoute) {
    if (caller === "signed-out") return request(testApp.app);
    // Signing out, in or up ends or replaces the session it is made with: those get their own.
    return SESSION_ROUTES.has(route.key as RouteKey) ? signedIn(testApp.app, BELLBIRD[caller]) : world.bellbird[caller];
  }

  async function send(
    caller: Caller,
    route: AppRoute,
    path: string,
    query: [string, string][] | undefined,
    body: Body,
    upload: Upload | undefined,
  ) {
    const agent = await agentFor(caller, route);
    const url =
      query && query.length > 0
        ? `${path}?${query.map(([name, value]) => `${safeEncode(name)}=${value}`).join("&")}`
        : path;
    const method = route.method.toLowerCase() as "get" | "post" | "put" | "patch" | "delete";
    const call = agent[method](url);
    if (upload) {
      for (const [name, value] of upload.fields) call.field(name, value);
      if (upload.file) call.attach(upload.file.field, upload.file.bytes, upload.file.name);
      return call;
    }
    if (method === "get" || body.kind === "none") return call;
    const text = body.kind === "raw" ? body.text : JSON.stringify(body.value);
    return text === undefined ? call : call.set("Content-Type", "application/json").send(text);
  }

  it("answers every route, for every role and signed out, without a 5xx, and every error as JSON with a message", async () => {
    const routes = appRoutes(testApp.app);
    expect(routes.length).toBeGreaterThan(70);
    let position = 0;
    for (const route of routes) {
      for (const caller of CALLERS) {
        position += 1;
        const upload = uploadFor(route);
        const requestArb = fc.record({
          path: paramArb(route),
          query: queryArb,
          body: bodyFor(samples[route.key as RouteKey]),
          upload: upload ? fc.option(upload, { nil: undefined, freq: 4 }) : fc.constant(undefined),
        });
        await fc.assert(
          fc.asyncProperty(requestArb, async ({ path, query, body, upload: files }) => {
            total += 1;
            const response = await send(caller, route, path, query, body, files);
            const what = `${route.key} as ${caller}: ${response.status} ${JSON.stringify(response.body).slice(0, 300)}`;
            expect(response.status, what).toBeLessThan(500);
            if (response.status >= 400) {
              expect(response.headers["content-type"], what).toMatch(/^application\/json/);
              expect(typeof response.body.message, what).toBe("string");
              expect(response.body.message.length, what).toBeGreaterThan(0);
            }
          }),
          { seed: SEED + position, numRuns: RUNS_PER_ROUTE, endOnFailure: true },
        );
      }
    }
    // A few thousand requests: enough to meet every route's edges, few enough for two cores.
    expect(total).toBe(routes.length * CALLERS.length * RUNS_PER_ROUTE);
  }, 300_000);
});
