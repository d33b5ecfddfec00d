/**
 * Reads the published equation-of-state pack in ../shared/reference (generation
 * time and tests only; the files are never copied into the repository).
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { ReferenceFluidFile } from "./reference-types.ts";

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
export const referenceRoot = path.resolve(repoRoot, "../shared/reference");

export function referencePackExists(): boolean {
  return existsSync(path.join(referenceRoot, "fluids"));
}

/** Designations of every fluid file in the pack, e.g. "R1234ze(E)". */
export function listReferenceDesignations(): string[] {
  return readdirSync(path.join(referenceRoot, "fluids"))
    .filter((name) => name.endsWith(".json"))
    .map((name) => name.slice(0, -".json".length))
    .sort();
}

export function readReferenceFluid(designation: string): ReferenceFluidFile {
  const file = path.join(referenceRoot, "fluids", `${designation}.json`);
  return JSON.parse(readFileSync(file, "utf8")) as ReferenceFluidFile;
}

export function readReferenceManifest(): { source_repository: string; source_commit: string } {
  return JSON.parse(readFileSync(path.join(referenceRoot, "manifest.json"), "utf8"));
}
