/**
 * Builds each procedure record's stored result from its input by calling the procedures
 * engine; nothing here computes a figure itself. The server runs these on every save, so the
 * stored verdicts always come from the engine's current rules and the organisation's limits.
 */
import {
  checkTestPressure,
  currentImbalance,
  judgeInsulationResistance,
  judgeLeakSearch,
  judgeSupplyVoltage,
  judgeVoltageImbalance,
  pressureTestResult,
  runningCurrent,
  singlePhaseWindings,
  voltageImbalance,
  windingBalance,
} from "@shared/engine/index.ts";
import type {
  ElectricalCheckInput,
  ElectricalCheckResult,
  LeakSearchInput,
  OverallVerdict,
  PressureTestRecordInput,
  PressureTestRecordResult,
} from "@shared/schemas/procedure-records.ts";
import type { InsulationKind, ProcedureLimits, RunningCurrentKind, Verdict } from "@shared/schemas/procedures.ts";

const SEVERITY = { pass: 0, warn: 1, fail: 2 } as const;

/** The worst of several judged checks (fail over warn over pass; the first among equals). */
export function worstOf(checks: { check: string; verdict: Verdict }[]): OverallVerdict {
  const [first, ...rest] = checks;
  if (!first) throw new Error("worstOf requires at least one check");
  const worst = rest.reduce(
    (current, candidate) =>
      SEVERITY[candidate.verdict.verdict] > SEVERITY[current.verdict.verdict] ? candidate : current,
    first,
  );
  return {
    check: worst.check,
    verdict: worst.verdict.verdict,
    reason: worst.verdict.reason,
    source: worst.verdict.source,
  };
}

const INSULATION_KIND: Record<ElectricalCheckInput["target"], InsulationKind> = {
  compressor: "compressor",
  fan: "motor",
  supply: "wiring",
};
const CURRENT_KIND: Partial<Record<ElectricalCheckInput["target"], RunningCurrentKind>> = {
  compressor: "compressor-rla",
  fan: "fan-fla",
};

export function electricalCheckResult(
  input: ElectricalCheckInput,
  limits: ProcedureLimits = {},
): ElectricalCheckResult {
  const checks: { check: string; verdict: Verdict }[] = [];
  const volts = input.supplyVolts;
  const threePhaseVolts = volts && volts.length === 3 ? (volts as [number, number, number]) : null;
  const voltageImbalancePercent = threePhaseVolts ? voltageImbalance(threePhaseVolts) : null;
  const imbalanceVerdict =
    voltageImbalancePercent === null ? null : judgeVoltageImbalance(voltageImbalancePercent, limits.voltageImbalance);
  if (imbalanceVerdict) checks.push({ check: "Voltage imbalance", verdict: imbalanceVerdict });
  const supplyVoltage =
    volts && input.nameplateV
      ? judgeSupplyVoltage({ measuredV: volts, nameplateV: input.nameplateV }, limits.supplyVoltage)
      : null;
  if (supplyVoltage) checks.push({ check: "Supply voltage", verdict: supplyVoltage });

  const insulation = input.insulation.map((reading) => ({
    ...judgeInsulationResistance(
      { megohms: reading.megohms, testVoltageV: reading.testVoltageV, kind: INSULATION_KIND[input.target] },
      limits.insulation,
    ),
    ...(reading.point ? { point: reading.point } : {}),
  }));
  insulation.forEach((verdict) =>
    checks.push({ check: `Insulation${verdict.point ? ` ${verdict.point}` : ""}`, verdict }),
  );

  const windings = input.windingOhms ? windingBalance(input.windingOhms, limits.windingBalance) : null;
  if (windings) checks.push({ check: "Winding balance", verdict: windings });
  const terminals = input.singlePhaseWindingOhms
    ? singlePhaseWindings(input.singlePhaseWindingOhms, limits.singlePhaseWindings)
    : null;
  if (terminals) checks.push({ check: "Windings C–R, C–S, R–S", verdict: terminals });

  const kind = CURRENT_KIND[input.target];
  const amps = input.runningAmps ?? [];
  const running =
    kind && input.ratedA
      ? amps.map((value) => runningCurrent({ amps: value, ratedA: input.ratedA!, kind }, limits.runningCurrent))
      : [];
  running.forEach((verdict, index) =>
    checks.push({ check: amps.length > 1 ? `Running current L${index + 1}` : "Running current", verdict }),
  );
  const currentImbalancePercent =
    amps.length === 3 && amps.some((value) => value > 0) ? currentImbalance(amps as [number, number, number]) : null;

  return {
    voltageImbalancePercent,
    voltageImbalance: imbalanceVerdict,
    supplyVoltage,
    insulation,
    windingBalance: windings,
    singlePhaseWindings: terminals,
    runningCurrent: running,
    currentImbalancePercent,
    overall: worstOf(checks),
  };
}

export function leakSearchResult(input: LeakSearchInput): Verdict {
  return judgeLeakSearch({ leaks: input.leaks, recheck: input.recheck });
}

export function pressureTestRecordResult(
  input: PressureTestRecordInput,
  limits: ProcedureLimits = {},
): PressureTestRecordResult {
  const testPressure = checkTestPressure(
    { testGaugeKPa: input.testGaugeKPa, ratedKPa: input.ratedKPa },
    limits.testPressure,
  );
  const hold = pressureTestResult({
    startGaugeKPa: input.startGaugeKPa,
    startTempC: input.startTempC,
    endGaugeKPa: input.endGaugeKPa,
    endTempC: input.endTempC,
    allowedDropKPa: input.allowedDropKPa,
    atmosphericPressureKPa: input.atmosphericPressureKPa,
  });
  return {
    testPressure,
    hold,
    overall: worstOf([
      { check: "Test pressure", verdict: testPressure },
      { check: "Hold", verdict: hold },
    ]),
  };
}
