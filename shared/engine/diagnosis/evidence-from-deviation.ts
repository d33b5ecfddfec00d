import type { Evidence } from "../../schemas/diagnosis.ts";
import type { EvidenceProfile } from "./types.ts";

type ProfileEntry = readonly [state: Evidence["state"], below: number, inside: number, above: number];
const compiledProfiles = new WeakMap<EvidenceProfile, readonly ProfileEntry[]>();

function compile(profile: EvidenceProfile): readonly ProfileEntry[] {
  let entries = compiledProfiles.get(profile);
  if (!entries) {
    entries = Object.entries(profile).map(([state, weights]) => [state as Evidence["state"], weights![0], weights![1], weights![2]] as const);
    compiledProfiles.set(profile, entries);
  }
  return entries;
}

/**
 * Evidence for each state from a reading's signed deviation beyond its band and the strength
 * of that deviation (0–1, see `deviationStrength`). Each state's weight moves linearly from
 * its "inside" value at the band edge to its "below"/"above" value at full strength, so it is
 * continuous and, when the profile's three values are ordered, monotonic in the reading.
 * States whose weight is 0 are left out; the rest keep the profile's order (no sorting: this
 * runs a dozen times per diagnosis).
 *
 * Units: deviation K (sign only is used), strength 0–1, weights dimensionless.
 *
 * @throws never
 * @example evidenceFromDeviation(-2.8, 1, { undercharged: [1, 0, -1] }) // [{ state: "undercharged", weight: 1 }]
 */
export function evidenceFromDeviation(deviationK: number, strength: number, profile: EvidenceProfile): Evidence[] {
  const evidence: Evidence[] = [];
  const entries = compile(profile);
  for (let index = 0; index < entries.length; index += 1) {
    const entry = entries[index]!;
    const inside = entry[2];
    const outer = deviationK < 0 ? entry[1] : deviationK > 0 ? entry[3] : inside;
    const weight = inside + (outer - inside) * strength;
    if (weight !== 0) evidence.push({ state: entry[0], weight });
  }
  return evidence;
}
