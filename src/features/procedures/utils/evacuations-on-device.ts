import { evacuationResult } from "@shared/engine/index.ts";
import type { Evacuation, EvacuationList } from "@shared/schemas/procedure-records.ts";
import type { OutboxEntry } from "@/features/offline/outbox-store.ts";
import { evacuationSamplesPath } from "@/lib/api/procedure-paths.ts";

/** An evacuation as this device shows it; `onDevice`: started here without signal, not on the server yet. */
export type ShownEvacuation = Evacuation & { onDevice: boolean };

interface KeptSample {
  minutes: number;
  microns: number;
  clientId: string;
}

/**
 * A visit's evacuations as this device knows them (README decision 027): the server's, with the
 * readings still waiting on the device added, and those started without signal, built from the
 * outbox. Each is judged again by the engine's own `evacuationResult` with the company's limits,
 * so the chart and the verdict move as readings are entered, as the server will judge them.
 * Refused entries are not counted: they are listed with their reason until dealt with.
 */
export function evacuationsOnDevice(
  list: EvacuationList | undefined,
  entries: readonly OutboxEntry[],
  visitId: string,
): ShownEvacuation[] {
  const waiting = entries.filter((entry) => entry.visitId === visitId && entry.state === "waiting");
  const samplesFor = (evacuation: { id: string; clientId: string | null }): KeptSample[] => {
    const paths = new Set([
      evacuationSamplesPath(visitId, evacuation.id),
      evacuation.clientId && evacuationSamplesPath(visitId, evacuation.clientId),
    ]);
    return waiting
      .filter((entry) => entry.kind === "evacuation-sample" && paths.has(entry.path))
      .map((entry) => entry.body as unknown as KeptSample);
  };
  const judged = (evacuation: Evacuation, kept: KeptSample[], onDevice: boolean): ShownEvacuation => {
    // A reading the server already holds (sent, not yet cleared from the outbox) counts once.
    const held = new Set(evacuation.samples.map((sample) => sample.clientId));
    const added = kept.filter((sample) => !held.has(sample.clientId));
    if (added.length === 0 && !onDevice) return { ...evacuation, onDevice };
    const samples = [...evacuation.samples, ...added].sort((a, b) => a.minutes - b.minutes);
    const result = evacuationResult(
      samples,
      evacuation.targetMicrons,
      evacuation.isolatedAtMinutes,
      list?.defaults.limits,
    );
    return { ...evacuation, samples, result, onDevice };
  };

  const stored = list?.evacuations ?? [];
  const storedClientIds = new Set(stored.map((evacuation) => evacuation.clientId));
  const started = waiting
    .filter((entry) => entry.kind === "evacuation" && !storedClientIds.has(entry.clientId))
    .map((entry): Evacuation => {
      const body = entry.body as { targetMicrons?: number; startedAt?: string };
      const targetMicrons = body.targetMicrons ?? list?.defaults.targetMicrons ?? 500;
      return {
        id: entry.clientId,
        clientId: entry.clientId,
        visitId,
        startedAt: body.startedAt ?? entry.takenAt,
        updatedAt: entry.takenAt,
        recordedBy: null,
        targetMicrons,
        isolatedAtMinutes: null,
        samples: [],
        note: null,
        result: evacuationResult([], targetMicrons, null),
        version: 0,
        voided: null,
      };
    });
  return [
    ...stored.map((evacuation) => judged(evacuation, samplesFor(evacuation), false)),
    ...started.map((evacuation) => judged(evacuation, samplesFor(evacuation), true)),
  ].sort((a, b) => Date.parse(a.startedAt) - Date.parse(b.startedAt));
}
