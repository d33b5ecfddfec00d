/**
 * Sources behind the diagnosis rules, by the tags of the project's trade research notes
 * (TRADE.md, "Sources"). Every rule and limit names its source with `cite(DIAGNOSIS_SOURCES, …)`,
 * or says "common practice" / "memory" (./marks.ts) where no source was found. The procedure
 * limits keep their own list (./procedure-sources.ts): some tags carry the page or figure a
 * procedure reads, so one tag's title may be longer there.
 */
export const DIAGNOSIS_SOURCES = {
  S1: "Arkema Forane technical centre, Definitions (bubble point, dew point, glide)",
  S2: "HVAC School, What Is Temperature Glide?",
  S9: "Daikin DZ13SC installation manual p. 9",
  S10: "California Energy Commission, 2008 Reference Residential Appendices, RA3.2 refrigerant charge verification",
  S11: "Fujitsu FO20R series installation manual §5.8",
  S13: "J. Tomczyk, ACHR News, compressor superheated discharge temperatures",
  S14: "knowyourhvac.com, Subcooling (weak)",
  S15: "HVAC School, TD of Refrigeration Evaporators",
  S17: "Lennox Merit 14ACX/13ACX unit manuals, superheat charging tables",
  S18: "Carrier 38TUA installation instructions, Table 6 superheat charging (SI)",
  S19: "California Energy Commission, 2013 Reference Residential Appendix RA3.2.1 (outdoor ≥ 55 °F)",
  S20: "Friedrich Hazardgard / RV products 9000 series service manuals",
  S21: "refrigeration-engineer.com, 9 superheat & subcooling scenarios",
  S22: "J. Tomczyk, ACHR News, Troubleshooting a Refrigerant Undercharge",
  S23: "J. Tomczyk, ACHR News, The Professor: System Overcharge",
  S24: "J. Tomczyk, Tips for Troubleshooting Air Conditioning Systems, Part 2",
  S25: "coloradocomfortair.com, Liquid line restriction (weak)",
  S26: "HVAC School, The Approach Method of Charging and Condenser Efficiency",
  S27: "iheatcool.com, How to Diagnose Non-Condensables (weak)",
  S28: "Behler-Young tech tip, Non-Condensables in a Refrigeration System",
  S29: "J. Tomczyk, ACHR News article 124501 (low head / high suction)",
  S30: "Carrier 06E compressor service manual p. 32",
  S31: "US Army TM 55-1905-220-14-8, §4-31 (non-condensable test)",
  S33: "HVAC School, What should the Air Delta T be?",
  S34: "Armstrong 4SHP16LT manual p. 16 (approach charging)",
  S35: "air-conditioning-and-refrigeration-guide.com, refrigeration condenser page (weak)",
  S37: "HVAC School, Why Discharge Line Temperature is a Useful Reading",
  S38: "HVAC School, Why Compression Ratio Matters",
  S39: "rhvactools.com, Compressor Rated Load Amperage (weak)",
  S122: "Manufacturer troubleshooting charts (pressure pairings)",
} as const;

export type DiagnosisSourceTag = keyof typeof DIAGNOSIS_SOURCES;
