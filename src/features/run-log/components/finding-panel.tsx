import { useId } from "react";
import { ArrowDown, ArrowUp, Ban, Equal, Minus, OctagonAlert, TriangleAlert, type LucideIcon } from "lucide-react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import type { DiagnosisResult, Finding } from "@shared/schemas/diagnosis.ts";
import { CHARGE_STATE_ICONS, chargeStateTone } from "@/components/ui/state/charge-state-badge.tsx";
import { cn } from "@/lib/cn.ts";
import { numberSources } from "../utils/number-sources.ts";
import { ChargeEstimate } from "./charge-estimate.tsx";
import { SourceNote } from "./source-note.tsx";

const DIRECTION: Record<Finding["direction"], { icon: LucideIcon; word: string }> = {
  low: { icon: ArrowDown, word: "low" },
  high: { icon: ArrowUp, word: "high" },
  normal: { icon: Equal, word: "in band" },
  excluded: { icon: Ban, word: "not used" },
  "not-judged": { icon: Minus, word: "not judged" },
  summary: { icon: Equal, word: "signature" },
};

/** Confidence in words first; the number is there for those who want it. */
export function confidenceWords(confidence: number): string {
  const percent = Math.round(confidence * 100);
  const words = confidence >= 0.8 ? "Strong evidence" : confidence >= 0.55 ? "Fair evidence" : "Weak evidence";
  return `${words} (${percent} %)`;
}

const SEVERITY: Record<
  DiagnosisResult["warnings"][number]["severity"],
  { icon: LucideIcon; word: string; tone: string }
> = {
  danger: { icon: OctagonAlert, word: "Danger", tone: "border-fault text-fault" },
  "invalid-data": { icon: Ban, word: "Not used", tone: "border-caution text-caution" },
  caution: { icon: TriangleAlert, word: "Caution", tone: "border-caution text-caution" },
};

/** A reference marker on a printed line, pointing at its entry in the numbered list below. */
function NoteMarker({ number, idPrefix }: { number: number; idPrefix: string }) {
  return (
    <sup className="num ml-0.5 text-xs">
      <a href={`#${idPrefix}-${number}`} aria-label={`source ${number}`} className="text-accent no-underline">
        [{number}]
      </a>
    </sup>
  );
}

interface FindingPanelProps {
  result: DiagnosisResult;
  pending?: boolean;
  /**
   * "run-log": evidence folded behind "Why: N points", each source behind a tap.
   * "report": evidence printed open, each line with a [n] marker, the sources numbered once at
   * the end of the finding (a printed page cannot be tapped).
   */
  variant?: "run-log" | "report";
}

/** The verdict in words, its evidence line by line, and warnings about the readings themselves. */
export function FindingPanel({ result, pending = false, variant = "run-log" }: FindingPanelProps) {
  const idPrefix = useId().replace(/:/g, "");
  const report = variant === "report";
  const state = result.chargeState;
  const Icon = CHARGE_STATE_ICONS[state];
  const text = chargeStateText[state];
  const alternatives = result.alternatives.filter((alternative) => alternative.state !== state).slice(0, 2);
  // Warnings first, then evidence: the order they are printed, so the notes read 1, 2, 3 down the page.
  const notes = numberSources([
    ...result.warnings.map((warning) => warning.source),
    ...result.findings.map((finding) => finding.source),
  ]);
  const warningNote = (index: number) => notes.numbers[index]!;
  const findingNote = (index: number) => notes.numbers[result.warnings.length + index]!;
  const points = result.findings.length;

  const evidence = (
    <ul className="space-y-2" aria-label="Evidence">
      {result.findings.map((finding, index) => {
        const direction = DIRECTION[finding.direction];
        return (
          <li key={`${finding.ruleId}-${finding.reading}`} className="flex gap-2 border-t border-rule pt-2">
            <direction.icon aria-hidden className="mt-0.5 size-5 shrink-0 text-muted" />
            <div className="min-w-0 flex-1">
              <p>
                <span className="sr-only">{direction.word}: </span>
                {finding.message}
                {report && <NoteMarker number={findingNote(index)} idPrefix={idPrefix} />}
              </p>
              {!report && <SourceNote source={finding.source} />}
            </div>
          </li>
        );
      })}
    </ul>
  );

  return (
    <section
      aria-label="Finding"
      aria-live="polite"
      className={cn(
        "rounded-card border-2 bg-surface p-4",
        chargeStateTone(state).split(" ")[1],
        pending && "opacity-70",
      )}
    >
      <div className="flex items-start gap-3">
        <Icon
          aria-hidden
          className={cn("mt-0.5 size-8 shrink-0", chargeStateTone(state).split(" ")[0])}
          strokeWidth={2.4}
        />
        <div className="min-w-0">
          <h2 className="text-xl font-semibold" data-testid="charge-state">
            {text.title}
          </h2>
          {state !== "insufficient-data" && <p className="text-sm text-muted">{confidenceWords(result.confidence)}</p>}
          <p className="mt-1">{text.nextStep}</p>
          {alternatives.length > 0 && (
            <p className="mt-1 text-sm text-muted">
              Also possible:{" "}
              {alternatives
                .map(
                  (alternative) =>
                    `${chargeStateText[alternative.state].title} (${Math.round(alternative.confidence * 100)} %)`,
                )
                .join("; ")}
            </p>
          )}
          <ChargeEstimate result={result} />
        </div>
      </div>

      {result.warnings.length > 0 && (
        <ul className="mt-3 space-y-2" aria-label="Warnings and cautions">
          {result.warnings.map((warning, index) => {
            const severity = SEVERITY[warning.severity];
            return (
              <li key={warning.code} className={cn("flex gap-2 rounded-card border-2 p-2", severity.tone)}>
                <severity.icon aria-hidden className="mt-0.5 size-5 shrink-0" />
                <div className="min-w-0 flex-1">
                  <p className="font-medium">
                    {severity.word}: <span className="text-ink">{warning.message}</span>
                    {report && <NoteMarker number={warningNote(index)} idPrefix={idPrefix} />}
                  </p>
                  {!report && <SourceNote source={warning.source} />}
                </div>
              </li>
            );
          })}
        </ul>
      )}

      {points > 0 &&
        (report ? (
          <div className="mt-3">
            <h3 className="font-medium">Why: {points === 1 ? "1 point" : `${points} points`}</h3>
            {evidence}
          </div>
        ) : (
          // Folded on every screen: the verdict and the next step are what is acted on; the
          // reasons are one tap away and do not push the entry cards out of reach.
          <details className="mt-3" data-testid="evidence">
            <summary className="min-h-touch cursor-pointer py-2 font-medium">
              Why: {points === 1 ? "1 point" : `${points} points`}
            </summary>
            {evidence}
          </details>
        ))}

      {report && notes.list.length > 0 && (
        <ol aria-label="Sources" className="mt-3 space-y-1 border-t-2 border-rule pt-2 text-xs text-muted">
          {notes.list.map((source, index) => (
            <li key={source} id={`${idPrefix}-${index + 1}`} className="flex gap-2">
              <span className="num shrink-0">[{index + 1}]</span>
              <span>{source}</span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
