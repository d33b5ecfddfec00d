import { apparentIsentropicEfficiency } from "../apparent-isentropic-efficiency.ts";
import {
  COMPRESSOR_EFFICIENCY_BAND,
  COMPRESSOR_EFFICIENCY_FULL_STRENGTH,
  COMPRESSOR_EFFICIENCY_SOURCE,
} from "../diagnosis-limits.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** The band and its full-strength distance in percent, the unit the finding speaks in. */
const BAND_PERCENT = { lowK: COMPRESSOR_EFFICIENCY_BAND.lowK * 100, highK: Number.POSITIVE_INFINITY };
const FULL_STRENGTH_PERCENT = COMPRESSOR_EFFICIENCY_FULL_STRENGTH * 100;

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) =>
    `The compressor's apparent isentropic efficiency is only ${value} % (below ${band} %): it puts far more work into the gas than compression needs — gas leaking back through its valves is compressed twice`,
  normal: (value) => `The compressor's apparent isentropic efficiency is ${value} %`,
  high: (value) => `The compressor's apparent isentropic efficiency is ${value} %`,
};

/**
 * The measured cycle's compressor: the apparent isentropic efficiency from the suction and
 * discharge states (single-phase tables). Far below its class it supports a compressor that no
 * longer pumps. Silent in its band (a hermetic's motor heat already reads it low), when the
 * refrigerant's single-phase table is not loaded, or when a reading is missing.
 */
export const compressorEfficiencyRule: DiagnosisRule = {
  id: "compressor-efficiency",
  description:
    "Apparent isentropic efficiency of the compressor from the measured cycle: far below its class, gas is compressed twice (weak compressor)",
  source: COMPRESSOR_EFFICIENCY_SOURCE,
  evaluate(snapshot) {
    const efficiency = apparentIsentropicEfficiency(snapshot);
    if (efficiency === null || efficiency >= COMPRESSOR_EFFICIENCY_BAND.lowK) return NO_OUTPUT;
    return {
      findings: [
        bandedFinding(
          {
            ruleId: this.id,
            reading: "compressorEfficiency",
            value: efficiency * 100,
            unit: "%",
            band: BAND_PERCENT,
            bandText: `${BAND_PERCENT.lowK}`,
            fullStrength: FULL_STRENGTH_PERCENT,
            feature: "compressorEfficiency",
            family: snapshot.meteringFamily,
            messages: MESSAGES,
            source: COMPRESSOR_EFFICIENCY_SOURCE,
          },
          snapshot,
        ),
      ],
      warnings: [],
    };
  },
};
