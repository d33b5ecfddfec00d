/**
 * Safety class and GWP100 of each refrigerant. Safety classes follow ASHRAE 34 /
 * ISO 817; GWP100 values follow IPCC AR4 WG1 Table 2.14 and AR5 WG1 Table 8.A.1, with
 * blends as mass-weighted sums of their components (HFOs taken as R1234yf = 4 and
 * R1234ze(E) = 7 for AR4, as in the EU F-gas Regulation, and as 1 for AR5). Values were
 * transcribed from the project's trade notes (/work/shared/TRADE.md §7.2, which cites the
 * ASHRAE 34 / ISO 817 lists via [S80]). The reference EOS pack's own INFO.ENVIRONMENTAL
 * block is outdated (pre-"2L" classes) and is deliberately not used.
 *
 * Refrigerants TRADE.md §7.2 does not list (R125, R143a, R12, R123, R1233zd(E), R152a,
 * R13I1) carry values from memory, flagged `fromMemory`; verify before relying on them.
 * Blends it does not list (R407A, R407F, R452B, R454C, R455A, R466A) get their GWP
 * computed here as the mass-weighted sum of the component entries below (`computedGwp`,
 * flagged fromMemory when any component value is) and safety classes from memory.
 */

export interface GwpEntry {
  /** number for CO₂e arithmetic (an upper bound where `display` is "<1") */
  value: number;
  display: string;
  fromMemory: boolean;
  note?: string;
}

export interface RefrigerantMetadataSource {
  name: string;
  composition?: string;
  safetyClass: string;
  safetyClassFromMemory: boolean;
  gwp100: { AR4: GwpEntry | null; AR5: GwpEntry | null };
}

const sourced = (value: number, note?: string): GwpEntry => ({
  value,
  display: String(value),
  fromMemory: false,
  ...(note ? { note } : {}),
});
const remembered = (value: number, display = String(value), note?: string): GwpEntry => ({
  value,
  display,
  fromMemory: true,
  ...(note ? { note } : {}),
});

const PURE_METADATA: Record<string, RefrigerantMetadataSource> = {
  R22: {
    name: "HCFC-22 (chlorodifluoromethane)",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: { AR4: sourced(1810), AR5: sourced(1760) },
  },
  R32: {
    name: "HFC-32 (difluoromethane)",
    safetyClass: "A2L",
    safetyClassFromMemory: false,
    gwp100: { AR4: sourced(675), AR5: sourced(677) },
  },
  R134a: {
    name: "HFC-134a (1,1,1,2-tetrafluoroethane)",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: { AR4: sourced(1430), AR5: sourced(1300) },
  },
  R410A: {
    name: "R410A (R32/R125 blend)",
    composition: "R32/R125 50/50 mass %",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: {
      AR4: sourced(2088, "mass-weighted sum of components"),
      AR5: sourced(1924, "mass-weighted sum of components"),
    },
  },
  R404A: {
    name: "R404A (R125/R143a/R134a blend)",
    composition: "R125/R143a/R134a 44/52/4 mass %",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: {
      AR4: sourced(3922, "mass-weighted sum of components"),
      AR5: sourced(3943, "mass-weighted sum of components"),
    },
  },
  R407C: {
    name: "R407C (R32/R125/R134a blend)",
    composition: "R32/R125/R134a 23/25/52 mass %",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: {
      AR4: sourced(1774, "mass-weighted sum of components"),
      AR5: sourced(1624, "mass-weighted sum of components"),
    },
  },
  R507A: {
    name: "R507A (R125/R143a azeotrope)",
    composition: "R125/R143a 50/50 mass %",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: {
      AR4: sourced(3985, "mass-weighted sum of components"),
      AR5: sourced(3985, "mass-weighted sum of components"),
    },
  },
  R290: {
    name: "R290 (propane)",
    safetyClass: "A3",
    safetyClassFromMemory: false,
    gwp100: { AR4: remembered(3, "3", "EU F-gas value"), AR5: remembered(1, "<1") },
  },
  R600a: {
    name: "R600a (isobutane)",
    safetyClass: "A3",
    safetyClassFromMemory: false,
    gwp100: { AR4: remembered(3, "3", "EU F-gas value"), AR5: remembered(1, "<1") },
  },
  R744: {
    name: "R744 (carbon dioxide)",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: { AR4: sourced(1), AR5: sourced(1) },
  },
  R717: {
    name: "R717 (ammonia)",
    safetyClass: "B2L",
    safetyClassFromMemory: false,
    gwp100: { AR4: sourced(0), AR5: sourced(0) },
  },
  R1234yf: {
    name: "HFO-1234yf (2,3,3,3-tetrafluoropropene)",
    safetyClass: "A2L",
    safetyClassFromMemory: false,
    gwp100: {
      AR4: sourced(4, "EU F-gas value; not assessed in AR4"),
      AR5: { value: 1, display: "<1", fromMemory: false },
    },
  },
  "R1234ze(E)": {
    name: "HFO-1234ze(E) (trans-1,3,3,3-tetrafluoropropene)",
    safetyClass: "A2L",
    safetyClassFromMemory: false,
    gwp100: {
      AR4: sourced(7, "EU F-gas value; not assessed in AR4"),
      AR5: { value: 1, display: "<1", fromMemory: false },
    },
  },
  R125: {
    name: "HFC-125 (pentafluoroethane)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(3500), AR5: remembered(3170) },
  },
  R143a: {
    name: "HFC-143a (1,1,1-trifluoroethane)",
    safetyClass: "A2L",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(4470), AR5: remembered(4800) },
  },
  R12: {
    name: "CFC-12 (dichlorodifluoromethane)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(10900), AR5: remembered(10200) },
  },
  R123: {
    name: "HCFC-123 (2,2-dichloro-1,1,1-trifluoroethane)",
    safetyClass: "B1",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(77), AR5: remembered(79) },
  },
  "R1233zd(E)": {
    name: "HCFO-1233zd(E) (trans-1-chloro-3,3,3-trifluoropropene)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: { AR4: null, AR5: remembered(1) },
  },
  R152a: {
    name: "HFC-152a (1,1-difluoroethane)",
    safetyClass: "A2",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(124), AR5: remembered(138) },
  },
  R13I1: {
    name: "R13I1 (trifluoroiodomethane, CF3I; blend component of R466A)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: { AR4: remembered(0.4, "0.4"), AR5: null },
  },
};

/**
 * Mass-weighted GWP100 of a blend from the component entries above (the rule TRADE.md
 * §7.2 states), rounded to an integer.
 * @param parts component designation and mass percent
 * @throws Error when a component has no entry for that assessment
 */
export function computedGwp(parts: ReadonlyArray<readonly [string, number]>, assessment: "AR4" | "AR5"): GwpEntry {
  let sum = 0;
  let fromMemory = false;
  const notes: string[] = [];
  for (const [designation, percent] of parts) {
    let entry = PURE_METADATA[designation]?.gwp100[assessment] ?? null;
    if (!entry && designation === "R13I1") {
      // CF3I is not in AR5 Table 8.A.1 as remembered here; its AR4 value 0.4 changes the sum by < 0.2
      entry = PURE_METADATA.R13I1!.gwp100.AR4;
      notes.push("R13I1 taken at its AR4 value 0.4");
    }
    if (!entry) throw new Error(`computedGwp: no ${assessment} value for ${designation}`);
    sum += (percent / 100) * entry.value;
    fromMemory ||= entry.fromMemory;
  }
  const value = Math.round(sum);
  return {
    value,
    display: String(value),
    fromMemory,
    note: ["mass-weighted sum of components, computed", ...notes].join("; "),
  };
}

const blendGwp = (parts: ReadonlyArray<readonly [string, number]>) => ({
  AR4: computedGwp(parts, "AR4"),
  AR5: computedGwp(parts, "AR5"),
});
const listedGwp = (ar4: number, ar5: number) => ({
  AR4: sourced(ar4, "mass-weighted sum of components"),
  AR5: sourced(ar5, "mass-weighted sum of components"),
});

/**
 * Blends computed with the multi-fluid mixture model (issue 9); compositions come from
 * blends.tsv at generation time. GWP of the blends TRADE.md §7.2 lists is taken as
 * listed (a test recomputes it); the others are computed.
 */
const MIXTURE_METADATA: Record<string, RefrigerantMetadataSource> = {
  R407A: {
    name: "R407A (R32/R125/R134a blend)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R32", 20],
      ["R125", 40],
      ["R134a", 40],
    ]),
  },
  R407F: {
    name: "R407F (R32/R125/R134a blend)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R32", 30],
      ["R125", 30],
      ["R134a", 40],
    ]),
  },
  R448A: {
    name: "R448A (R32/R125/R1234yf/R134a/R1234ze(E) blend)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: listedGwp(1387, 1273),
  },
  R449A: {
    name: "R449A (R32/R125/R1234yf/R134a blend)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: listedGwp(1397, 1282),
  },
  R452A: {
    name: "R452A (R32/R125/R1234yf blend)",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: listedGwp(2140, 1945),
  },
  R452B: {
    name: "R452B (R32/R125/R1234yf blend)",
    safetyClass: "A2L",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R32", 67],
      ["R125", 7],
      ["R1234yf", 26],
    ]),
  },
  R454B: {
    name: "R454B (R32/R1234yf blend)",
    safetyClass: "A2L",
    safetyClassFromMemory: true,
    gwp100: listedGwp(466, 467),
  },
  R454C: {
    name: "R454C (R32/R1234yf blend)",
    safetyClass: "A2L",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R32", 21.5],
      ["R1234yf", 78.5],
    ]),
  },
  R455A: {
    name: "R455A (R744/R32/R1234yf blend)",
    safetyClass: "A2L",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R744", 3],
      ["R32", 21.5],
      ["R1234yf", 75.5],
    ]),
  },
  R513A: {
    name: "R513A (R1234yf/R134a azeotrope)",
    safetyClass: "A1",
    safetyClassFromMemory: false,
    gwp100: listedGwp(631, 573),
  },
  R466A: {
    name: "R466A (R32/R125/R13I1 blend)",
    safetyClass: "A1",
    safetyClassFromMemory: true,
    gwp100: blendGwp([
      ["R32", 49],
      ["R125", 11.5],
      ["R13I1", 39.5],
    ]),
  },
};

export const REFRIGERANT_METADATA: Record<string, RefrigerantMetadataSource> = {
  ...PURE_METADATA,
  ...MIXTURE_METADATA,
};
