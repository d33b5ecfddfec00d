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

/**
 * For the table generators: stops the process with a plain message when the pack is absent;
 * otherwise the provenance note every generated table carries (source repository and commit).
 */
export function requireReferencePack(): string {
  if (!referencePackExists()) {
    console.error(`Reference equations of state not found at ${referenceRoot}; cannot generate tables.`);
    process.exit(1);
  }
  const manifest = readReferenceManifest();
  return `${manifest.source_repository} commit ${manifest.source_commit} (fluid files via the project's reference pack)`;
}
