/**
 * The usual cautions of the trade, shown wherever the work can hurt someone. Written in
 * Satura's own words; each names where it comes from (tags as in the trade notes the
 * team works from, or "common practice"). Satura advises: local codes, the maker's
 * instructions and licensed practice decide.
 */
export type CautionTopic =
  | "electrical"
  | "flammable"
  | "toxic"
  | "nitrogen"
  | "pressure"
  | "liquid-refrigerant"
  | "recovery-cylinder"
  | "height"
  | "hot-surface";

export interface Caution {
  topic: CautionTopic;
  title: string;
  points: string[];
  source: string;
}

export const DEFER_TO_CODES =
  "Satura advises; local codes, the equipment maker's instructions and licensed practice decide.";

export const cautions: Record<CautionTopic, Caution> = {
  electrical: {
    topic: "electrical",
    title: "Isolate, lock out, prove dead",
    points: [
      "Isolate every supply before work — there may be more than one (controls, crankcase heater).",
      "Lock the isolator with your own padlock and tag it.",
      "Treat parts as live until proven dead: prove the tester on a known live source, test, then prove the tester again.",
      "Discharge capacitors safely; inverter DC-bus capacitors can hold a dangerous voltage for minutes after isolation — wait and measure.",
      "Never megger a compressor while it is under vacuum.",
    ],
    source:
      "Electrical safety practice (WorkSafe/Energy Safe guidance, AS/NZS 4836; OSHA 29 CFR 1910.147 in the US); capacitor and vacuum points: makers' service manuals and common practice",
  },
  flammable: {
    topic: "flammable",
    title: "Flammable refrigerant (A2L / A3)",
    points: [
      "Check the area and brief everyone nearby; work in the open or with continuous ventilation.",
      "Use a leak detector suitable for flammable refrigerants — never a halide torch or naked flame.",
      "No ignition sources; keep a dry-powder or CO₂ extinguisher at hand for any hot work.",
      "Earth the system before charging; keep hoses short and cylinders upright.",
      "Never purge with air or oxygen; vent the vacuum pump exhaust away from ignition sources.",
      "Never charge a flammable refrigerant into equipment designed for a non-flammable one.",
    ],
    source:
      "IEC 60335-2-40 servicing requirements as reproduced in makers' service manuals; state gas-work licensing rules",
  },
  toxic: {
    topic: "toxic",
    title: "Toxic refrigerant (B2L ammonia)",
    points: [
      "Ammonia is toxic and corrosive to copper: wear the respiratory protection the site procedure requires.",
      "Work only with the plant's emergency procedure, detection and ventilation in place.",
    ],
    source: "ISO 817 / ASHRAE 34 safety group B2L; handling points from memory — follow the site's ammonia procedure",
  },
  nitrogen: {
    topic: "nitrogen",
    title: "Pressure testing with nitrogen",
    points: [
      "Use dry, oxygen-free nitrogen only — never oxygen or compressed air (oxygen with oil can explode).",
      "Always through a regulator, with a relief device set above the test pressure and below what would damage components.",
      "Never exceed the rated pressure of the lowest-rated component; isolate parts that cannot take the test.",
      "Raise the pressure in steps and stand clear; keep the cylinder upright.",
      "Nitrogen displaces oxygen: ventilate plant rooms and confined spaces.",
    ],
    source: "ASHRAE 15 field test procedure; makers' installation manuals",
  },
  pressure: {
    topic: "pressure",
    title: "Pressure",
    points: [
      "Keep test and working pressures within the system's rated limits.",
      "Wear eye protection and gloves when connecting or removing hoses.",
    ],
    source: "Common practice; makers' instructions",
  },
  "liquid-refrigerant": {
    topic: "liquid-refrigerant",
    title: "Liquid refrigerant",
    points: [
      "Liquid refrigerant flashing to vapour causes frostbite: gloves and eye protection on when handling liquid.",
      "Heavy vapour collects low down and displaces air in pits and small rooms.",
    ],
    source: "Safety data sheets of the refrigerants; common practice",
  },
  "recovery-cylinder": {
    topic: "recovery-cylinder",
    title: "Recovery cylinders",
    points: [
      "Fill a recovery cylinder to no more than 80 % of its safe liquid capacity — weigh it.",
      "Use only cylinders rated for the refrigerant's pressure and in test date; never mix refrigerants in one cylinder.",
    ],
    source: "Refrigerant handling codes of practice (e.g. the Australian refrigerant handling code); common practice",
  },
  height: {
    topic: "height",
    title: "Working at height",
    points: [
      "On a roof, stay inside the edge protection or clipped to a rated anchor; keep clear of skylights and fragile sheeting.",
      "Carry gauges, cylinders and tools up by hoist or line, not in your hands on the ladder; secure the ladder at the top.",
      "Stop in high wind, rain or ice; hot roof sheeting and glare tire you faster than you notice.",
    ],
    source:
      "Work-at-height regulations and codes of practice (e.g. Safe Work Australia, Managing the risk of falls at workplaces; OSHA 29 CFR 1926 Subpart M); common practice",
  },
  "hot-surface": {
    topic: "hot-surface",
    title: "Hot surfaces",
    points: [
      "The discharge line and compressor top run at 70–110 °C and above: touch them only through a clamp probe or gloves.",
      "Let a compressor cool before work on its terminals or shell; crankcase heaters stay hot with the unit off.",
    ],
    source: "Common practice; makers' service manuals",
  },
};
