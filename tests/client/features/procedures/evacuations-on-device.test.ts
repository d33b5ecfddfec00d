import { describe, expect, it } from "vitest";
import { evacuationResult } from "@shared/engine/index.ts";
import type { Evacuation, EvacuationList } from "@shared/schemas/procedure-records.ts";
import type { OutboxEntry } from "@/features/offline/outbox-store.ts";
import { evacuationsOnDevice } from "@/features/procedures/utils/evacuations-on-device.ts";
import { evacuationSamplesPath, procedureRecordsPath } from "@/lib/api/procedure-paths.ts";

const VISIT = "7a1f3f1e-2b6c-4d7e-9f00-000000000001";
const STORED = "7a1f3f1e-2b6c-4d7e-9f00-000000000002";
const STARTED_OFFLINE = "7a1f3f1e-2b6c-4d7e-9f00-000000000003";
/** 500 microns: the trade's usual target (TRADE.md; makers ask for 500 µm held [S52][S53]). */
const TARGET = 500;

const entry = (
  kind: OutboxEntry["kind"],
  clientId: string,
  path: string,
  body: Record<string, unknown>,
  state: OutboxEntry["state"] = "waiting",
): OutboxEntry => ({
  clientId,
  userId: "tech",
  visitId: VISIT,
  kind,
  label: kind,
  path,
  body: { ...body, clientId },
  takenAt: "2026-12-03T10:00:00.000Z",
  queuedAt: 0,
  state,
  attempts: 0,
});

const storedEvacuation: Evacuation = {
  id: STORED,
  clientId: null,
  visitId: VISIT,
  startedAt: "2026-12-03T09:00:00.000Z",
  updatedAt: "2026-12-03T09:10:00.000Z",
  recordedBy: null,
  targetMicrons: TARGET,
  isolatedAtMinutes: null,
  samples: [{ minutes: 5, microns: 4000, clientId: "sample-on-server" }],
  note: null,
  result: evacuationResult([{ minutes: 5, microns: 4000 }], TARGET, null),
  version: 1,
  voided: null,
};
const list: EvacuationList = { evacuations: [storedEvacuation], defaults: { targetMicrons: TARGET, limits: {} } };

describe("evacuationsOnDevice (what the evacuation panel shows without signal)", () => {
  it("adds readings waiting on the device to the stored evacuation and judges them as the server will", () => {
    const [shown] = evacuationsOnDevice(
      list,
      [entry("evacuation-sample", "sample-1", evacuationSamplesPath(VISIT, STORED), { minutes: 20, microns: 450 })],
      VISIT,
    );
    expect(shown!.samples.map((sample) => sample.microns)).toEqual([4000, 450]);
    // The same engine function the server stores results with, on the same samples.
    expect(shown!.result).toEqual(evacuationResult(shown!.samples, TARGET, null, {}));
    expect(shown!.result.reached).toEqual({ reached: true, atMinutes: 20 });
    expect(shown!.onDevice).toBe(false);
  });

  it("counts a reading the server already holds once, and leaves refused ones out", () => {
    const [shown] = evacuationsOnDevice(
      list,
      [
        entry("evacuation-sample", "sample-on-server", evacuationSamplesPath(VISIT, STORED), {
          minutes: 5,
          microns: 4000,
        }),
        entry(
          "evacuation-sample",
          "sample-refused",
          evacuationSamplesPath(VISIT, STORED),
          { minutes: 3, microns: 100 },
          "refused",
        ),
      ],
      VISIT,
    );
    expect(shown!.samples).toHaveLength(1);
    expect(shown!.result).toBe(storedEvacuation.result);
  });

  it("builds an evacuation started offline from the outbox, with its readings named by its client id", () => {
    const shown = evacuationsOnDevice(
      list,
      [
        entry("evacuation", STARTED_OFFLINE, procedureRecordsPath("evacuations", VISIT), {
          targetMicrons: 300,
          startedAt: "2026-12-03T11:00:00.000Z",
        }),
        entry("evacuation-sample", "offline-1", evacuationSamplesPath(VISIT, STARTED_OFFLINE), {
          minutes: 12,
          microns: 800,
        }),
      ],
      VISIT,
    );
    expect(shown.map((evacuation) => evacuation.id)).toEqual([STORED, STARTED_OFFLINE]);
    const started = shown[1]!;
    expect(started).toMatchObject({
      onDevice: true,
      targetMicrons: 300,
      startedAt: "2026-12-03T11:00:00.000Z",
      isolatedAtMinutes: null,
    });
    expect(started.samples).toEqual([expect.objectContaining({ minutes: 12, microns: 800 })]);
    expect(started.result.reached.reached).toBe(false);
  });

  it("shows an evacuation once when it has reached the server but its entry is still being cleared", () => {
    const sent = { ...storedEvacuation, id: "7a1f3f1e-2b6c-4d7e-9f00-000000000004", clientId: STARTED_OFFLINE };
    const shown = evacuationsOnDevice(
      { ...list, evacuations: [sent] },
      [
        entry("evacuation", STARTED_OFFLINE, procedureRecordsPath("evacuations", VISIT), { targetMicrons: 500 }),
        // A reading sent after it names it by its client id, and still counts on it.
        entry("evacuation-sample", "late", evacuationSamplesPath(VISIT, STARTED_OFFLINE), {
          minutes: 30,
          microns: 400,
        }),
      ],
      VISIT,
    );
    expect(shown).toHaveLength(1);
    expect(shown[0]!.samples.map((sample) => sample.microns)).toEqual([4000, 400]);
  });
});
