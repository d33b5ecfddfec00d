import { describeDecay } from "@shared/engine/index.ts";
import type { DecayVerdict } from "@shared/schemas/procedures.ts";
import type { Evacuation } from "@shared/schemas/procedure-records.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { formatVacuum, vacuumToDisplay, VACUUM_LABEL, type VacuumUnit } from "./vacuum-units.ts";
import { VerdictBadge, VerdictPanel } from "./verdict-badge.tsx";

export const DECAY_WORDS: Record<DecayVerdict, string> = { held: "Held", moisture: "Moisture", leak: "Leak" };
const STAGE_TEXT = {
  "pulling-down": "Pulling down",
  "decay-test": "Decay test running",
  judged: "Judged",
} as const;

/** The evacuation's state in words: target reached or not, then the decay verdict with its rise rate. */
export function EvacuationSummary({ evacuation, unit }: { evacuation: Evacuation; unit: VacuumUnit }) {
  const { result } = evacuation;
  const last = evacuation.samples.at(-1);
  const rate = result.decay
    ? `${formatNumber(vacuumToDisplay(result.decay.riseRateMicronsPerMinute, unit), 1)} ${VACUUM_LABEL[unit]}/min`
    : null;
  return (
    <div className="space-y-2">
      <p className="flex flex-wrap items-center gap-2 text-sm">
        <span className="font-medium">{STAGE_TEXT[result.stage]}</span>
        <span>· target {formatVacuum(evacuation.targetMicrons, unit)}</span>
        {last && (
          <span className="num">
            · last {formatVacuum(last.microns, unit)} at {formatNumber(last.minutes, 1)} min
          </span>
        )}
        <span>
          ·{" "}
          {result.reached.reached ? (
            <>
              target reached at <span className="num">{formatNumber(result.reached.atMinutes ?? 0, 1)} min</span>
            </>
          ) : (
            "target not reached yet"
          )}
        </span>
        {evacuation.isolatedAtMinutes !== null && (
          <span className="num">· valved off at {formatNumber(evacuation.isolatedAtMinutes, 1)} min</span>
        )}
      </p>
      {result.overall && result.decay ? (
        <VerdictPanel
          title="Decay test"
          testId="decay-verdict"
          verdict={result.overall.verdict}
          word={DECAY_WORDS[result.decay.verdict]}
          reason={`${result.decay.wording ? describeDecay(result.decay.wording, unit) : result.decay.reason} Rise rate ${rate}, final ${formatVacuum(result.decay.finalMicrons, unit)} after ${formatNumber(result.decayMinutes ?? 0, 0)} min${result.decay.levelledOff ? ", levelled off" : ""}.`}
          source={result.decay.source}
        />
      ) : (
        <p className="text-sm text-muted">
          {result.stage === "pulling-down"
            ? "Valve off the pump once the target is reached to start the decay test."
            : "Keep reading the gauge: the decay test needs a reading after valving off."}
        </p>
      )}
    </div>
  );
}

/** A compact line for the list of earlier evacuations. */
export function EvacuationBadge({ evacuation }: { evacuation: Evacuation }) {
  const { result } = evacuation;
  if (!result.overall || !result.decay) return <span className="text-sm text-muted">{STAGE_TEXT[result.stage]}</span>;
  return <VerdictBadge verdict={result.overall.verdict} word={DECAY_WORDS[result.decay.verdict]} />;
}
