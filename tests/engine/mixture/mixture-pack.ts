/**
 * Test helper: the blends of the reference pack as multi-fluid models. The pack lives
 * outside the repository (../shared/reference); tests that need it skip with a plain
 * reason when it is absent (CI always has it).
 */
import { existsSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import {
  createBlendModel,
  readBinaryPairs,
  readBlends,
  readDepartureFunctions,
  type BlendModel,
} from "../../../scripts/eos/mixture/index.ts";

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");
export const mixturesPath = path.join(path.resolve(repoRoot, "../shared"), "reference", "mixtures");
export const mixturePackPresent = existsSync(path.join(mixturesPath, "blends.tsv"));
export const mixturePackMissingReason = `skipped: the reference mixture parameters ${mixturesPath} are absent`;
if (!mixturePackPresent) console.warn(mixturePackMissingReason);

/** The four blends that also have a pseudo-pure EOS (Lemmon 2003) and keep it for their tables. */
export const PSEUDO_PURE_BLENDS = ["R410A", "R404A", "R407C", "R507A"] as const;
/** Blends whose tables come from the mixture model (issue 9). */
export const MULTI_FLUID_BLENDS = [
  "R407A",
  "R407F",
  "R448A",
  "R449A",
  "R452A",
  "R452B",
  "R454B",
  "R454C",
  "R455A",
  "R466A",
  "R513A",
] as const;

const cache = new Map<string, BlendModel>();

/** Multi-fluid model of one blend of blends.tsv at its nominal composition (cached). */
export function blendModel(designation: string): BlendModel {
  const cached = cache.get(designation);
  if (cached) return cached;
  const record = readBlends().find((blend) => blend.designation === designation);
  if (!record) throw new Error(`blends.tsv has no ${designation}`);
  const model = createBlendModel(record, readBinaryPairs(), readDepartureFunctions());
  cache.set(designation, model);
  return model;
}
