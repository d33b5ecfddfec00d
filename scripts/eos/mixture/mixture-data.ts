/**
 * Reads the multi-fluid mixture parameters of the reference pack
 * (../shared/reference/mixtures, README §7): binary interaction parameters,
 * departure functions and the ASHRAE blend compositions. Generation time and tests
 * only; the files are never copied into the repository.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { referenceRoot } from "../load-reference.ts";

/** One line of binary_pairs.json (CoolProp mixture_binary_pairs.json layout). */
export interface BinaryPairRecord {
  BibTeX: string;
  CAS1: string;
  CAS2: string;
  Name1: string;
  Name2: string;
  F: number;
  function?: string;
  betaT?: number;
  gammaT?: number;
  betaV?: number;
  gammaV?: number;
  /** Lemmon–Jacobsen linear form (K) */
  xi?: number;
  /** Lemmon–Jacobsen linear form (m³/mol) */
  zeta?: number;
}

export type DepartureFunctionRecord =
  | { Name: string; BibTeX: string; type: "Exponential"; n: number[]; t: number[]; d: number[]; l: number[] }
  | {
      Name: string;
      BibTeX: string;
      type: "GERG-2008";
      Npower: number;
      n: number[];
      t: number[];
      d: number[];
      eta: number[];
      epsilon: number[];
      beta: number[];
      gamma: number[];
    };

export interface BlendRecord {
  designation: string;
  components: string[];
  /** nominal mass percent, same order as components */
  massPercent: number[];
  /** path of the pseudo-pure EOS file in the pack, or null */
  pseudoPureFile: string | null;
  source: string;
}

const mixturesPath = (name: string) => path.join(referenceRoot, "mixtures", name);

export function readBinaryPairs(): BinaryPairRecord[] {
  return JSON.parse(readFileSync(mixturesPath("binary_pairs.json"), "utf8")) as BinaryPairRecord[];
}

export function readDepartureFunctions(): DepartureFunctionRecord[] {
  return JSON.parse(readFileSync(mixturesPath("departure_functions.json"), "utf8")) as DepartureFunctionRecord[];
}

/** Blends of blends.tsv in file order (comment lines start with #). */
export function readBlends(): BlendRecord[] {
  const lines = readFileSync(mixturesPath("blends.tsv"), "utf8")
    .split("\n")
    .filter((line) => line.trim() !== "" && !line.startsWith("#"));
  const [header, ...rows] = lines;
  const columns = header!.split("\t");
  const column = (name: string) => {
    const index = columns.indexOf(name);
    if (index < 0) throw new Error(`blends.tsv has no ${name} column`);
    return index;
  };
  const [designation, components, mass, pseudo, source] = [
    column("designation"),
    column("components"),
    column("mass_percent"),
    column("pseudo_pure_file"),
    column("source"),
  ];
  return rows.map((row) => {
    const cells = row.split("\t");
    const parts = cells[components]!.split("/");
    const massPercent = cells[mass]!.split("/").map(Number);
    if (parts.length !== massPercent.length || massPercent.some((value) => !(value > 0))) {
      throw new Error(`blends.tsv: ${cells[designation]} has mismatched components and mass percentages`);
    }
    return {
      designation: cells[designation]!,
      components: parts,
      massPercent,
      pseudoPureFile: cells[pseudo] === "-" ? null : cells[pseudo]!,
      source: cells[source]!,
    };
  });
}
