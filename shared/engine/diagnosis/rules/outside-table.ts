import type { DiagnosisWarning, Finding } from "../../../schemas/diagnosis.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../../sources/marks.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `property tables never extrapolate (${COMMON_PRACTICE})`;
const VERY_LOW_SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S21", "S22"])}; a compressor pulling the suction below the refrigerant's table runs hot and starved (${COMMON_PRACTICE})`;

/**
 * Reports readings the refrigerant's saturation table does not cover (never extrapolated). A
 * suction pressure below the table is itself a finding: the evaporator is starved (shortage,
 * restriction, or a coil blocked by ice), or the wrong refrigerant is selected.
 */
export const outsideTableRule: DiagnosisRule = {
  id: "outside-table",
  description:
    "A pressure outside the refrigerant's saturation table gives no saturation temperature; suction below it is a danger in itself",
  source: SOURCE,
  evaluate(snapshot) {
    if (snapshot.outsideTable.length === 0) return NO_OUTPUT;
    const warnings: DiagnosisWarning[] = snapshot.outsideTable.map((exclusion) => ({
      code: exclusion.code,
      severity: "invalid-data" as const,
      field: exclusion.field,
      message: exclusion.reason,
      source: SOURCE,
    }));
    const findings: Finding[] = [];
    const suctionBelow =
      snapshot.outsideTable.some((exclusion) => exclusion.field === "suctionPressureKPa") &&
      snapshot.evaporatingTempC === null &&
      snapshot.suctionPressureKPaAbs < snapshot.liquidPressureKPaAbs / 2;
    if (suctionBelow) {
      warnings.push({
        code: "suction-pressure-very-low",
        severity: "danger",
        field: "suctionPressureKPa",
        message: `Suction ${snapshot.input.suctionPressureKPa} kPa is below anything ${snapshot.input.refrigerant} boils at in service: the evaporator is starved or blocked (shortage, restriction, iced coil) — or the refrigerant is not ${snapshot.input.refrigerant}. Stop before the compressor overheats`,
        source: VERY_LOW_SOURCE,
      });
      findings.push({
        ruleId: this.id,
        reading: "suctionPressureKPa",
        value: snapshot.input.suctionPressureKPa,
        unit: "kPa",
        direction: "low",
        pointsTo: [
          { state: "undercharged", weight: 0.8 },
          { state: "restricted-metering", weight: 0.8 },
          { state: "low-evaporator-airflow", weight: 0.4 },
          { state: "normal", weight: -1.5 },
        ],
        message: `Suction pressure ${snapshot.input.suctionPressureKPa} kPa is below the refrigerant's table: the coil is starved`,
        source: VERY_LOW_SOURCE,
      });
    }
    return { findings, warnings };
  },
};
