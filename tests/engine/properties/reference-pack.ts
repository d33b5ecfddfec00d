/**
 * Test helper: the published EOS pack lives outside the repository, in
 * ../shared/reference. Tests that need it skip with a plain reason when it is absent
 * (CI always has it).
 */
import { existsSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");
export const referenceFluidsPath = path.join(path.resolve(repoRoot, "../shared"), "reference", "fluids");
export const referencePackPresent = existsSync(referenceFluidsPath);
export const referencePackMissingReason = `skipped: the reference equation-of-state pack ${referenceFluidsPath} is absent`;
if (!referencePackPresent) console.warn(referencePackMissingReason);
