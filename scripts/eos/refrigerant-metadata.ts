/**
 * Safety class and GWP100 of each refrigerant, transcribed from the project's trade
 * notes (/work/shared/TRADE.md §7.2, which cites ASHRAE 34 / ISO 817 lists via [S80]
 * and IPCC AR4 WG1 Table 2.14 / AR5 WG1 Table 8.A.1). The reference EOS pack's own
 * INFO.ENVIRONMENTAL block is outdated (pre-"2L" classes) and is deliberately not used.
 *
 * Refrigerants TRADE.md §7.2 does not list (R125, R143a, R12, R123, R1233zd(E),
 * R152a, R13I1) carry values from memory, flagged `fromMemory`; verify before relying on them.
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

export const REFRIGERANT_METADATA: Record<string, RefrigerantMetadataSource> = {
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
