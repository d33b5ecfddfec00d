/**
 * Sources behind the procedure limits, by the tags of the project's trade research notes
 * (source list). Titles are the real documents; every verdict's `source` is built with
 * `cite(PROCEDURE_SOURCES, …)`, or says "common practice" / "memory" (./marks.ts) where no
 * source was found.
 */
export const PROCEDURE_SOURCES = {
  S4: "ACHR News, The New Wave of Blends (500-micron industry standard; liquid charging of blends)",
  S1: "Arkema Forane technical centre, Definitions (bubble point, dew point, glide)",
  S10: "California Energy Commission, 2008 Reference Residential Appendices, RA3.2 refrigerant charge verification",
  S11: "Fujitsu FO20R series installation manual §5.8 (weigh-in, ±1 oz scale)",
  S27: "iheatcool.com, How to Diagnose Non-Condensables (weak)",
  S28: "Behler-Young tech tip, Non-Condensables in a Refrigeration System",
  S31: "US Army TM 55-1905-220-14-8, §4-31 (non-condensable test: standing saturation temperature more than 5 °F above the condenser medium)",
  S39: "rhvactools.com, Compressor Rated Load Amperage (RLA) (weak)",
  S40: "RV products 9000 series service manual p. 18 (±10 % voltage)",
  S41: "Trane CXRC-SVX01J installation manual p. 20 (2 % maximum voltage imbalance)",
  S42: "Carrier 50JZ product data p. 22; AAON RN series manual p. 47 (2 % maximum)",
  S43: "eng-tips.com threads quoting NEMA MG-1 (1 % recommended, above 5 % not recommended)",
  S44: "EC&M, Unbalanced current (NEMA MG-1; lead-to-lead resistance within 2 %)",
  S45: "Carrier/Carlyle 06E compressor manual p. 113 (current unbalance max 10 %)",
  S46: "G-W, Heating and Cooling Essentials (2022) p. 531 (identifying compressor terminals)",
  S47: "Detector Inspector help centre, Insulation Resistance (AS/NZS 3000 Wiring Rules, ≥ 1 MΩ) (weak)",
  S48: "Tecumseh AH5540E service handbook p. 49 (below 2 MΩ = ground fault)",
  S49: "HVAC School, Scroll Compressor Pump Down, Megohm Test & Fusite Terminals (Copeland AE4-1294)",
  S52: "Lennox/Haier 4HP16 installation instructions (500 µm held for 20 minutes)",
  S53: "ClimateMaster ACL and Fujitsu FO24 installation manuals §4.6–4.7 (500 µm for 15 minutes)",
  S54: "Amana remote heat pump service manual p. 7 (1500 / 5000 µm decay interpretation)",
  S55: "Deep Vacuum Principles and Applications, vacuum-gauge field guide",
  S57: "US Unified Facilities Guide Specification 15182 §3.3, refrigerant piping tests",
  S58: "Thermo King container unit maintenance manual, Pressure Rise Test",
  S60: "sens4.com, Units for vacuum measurement (1 Torr = 133.322 Pa = 1000 micron)",
  S61: "ANSI/ASHRAE Standard 15-1994 §10.1.2 Testing Procedure",
  S63: "US UFGS 15652A §3.2.1 (isolate equipment during pressure tests)",
  S64: "Behler-Young tech tip (close stop valves on pre-charged units before a nitrogen test)",
  S65: "LG ARUV / ARUN / ATNH installation manuals (leak test, temperature correction, worked example)",
  S74: "REFCOM TB017 v2, Pressure testing in changing ambient conditions",
  S78: "Evomart weighing-scales note, safe fill 80 % at 21 °C (weak)",
  S79: "HVAC School, recovery tank fill calculation",
} as const;

export type ProcedureSourceTag = keyof typeof PROCEDURE_SOURCES;
