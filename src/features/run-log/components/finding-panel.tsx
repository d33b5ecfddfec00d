import { useState } from "react";
import { ArrowDown, ArrowUp, Ban, Equal, Minus, OctagonAlert, TriangleAlert, type LucideIcon } from "lucide-react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import type { DiagnosisResult, Finding } from "@shared/schemas/diagnosis.ts";
import { CHARGE_STATE_ICONS, chargeStateTone } from "@/components/ui/state/charge-state-badge.tsx";
import { cn } from "@/lib/cn.ts";
import { ChargeEstimate } from "./charge-estimate.tsx";

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

const SEVERITY: Record<DiagnosisResult["warnings"][number]["severity"], { icon: LucideIcon; word: string; tone: string }> = {
  danger: { icon: OctagonAlert, word: "Danger", tone: "border-fault text-fault" },
  "invalid-data": { icon: Ban, word: "Not used", tone: "border-caution text-caution" },
  caution: { icon: TriangleAlert, word: "Caution", tone: "border-caution text-caution" },
};

/** The verdict in words, its evidence line by line, and warnings about the readings themselves. */
export function FindingPanel({ result, pending = false, expanded = false }: { result: DiagnosisResult; pending?: boolean; expanded?: boolean }) {
  // Open on tablets and desktops; on a phone the evidence starts folded so the entry cards
  // stay within reach, one tap away.
  const [evidenceOpen] = useState(() => expanded || typeof window === "undefined" || window.matchMedia("(min-width: 768px)").matches);
  const state = result.chargeState;
  const Icon = CHARGE_STATE_ICONS[state];
  const text = chargeStateText[state];
  const alternatives = result.alternatives.filter((alternative) => alternative.state !== state).slice(0, 2);
  return (
    <section aria-label="Finding" aria-live="polite" className={cn("rounded-card border-2 bg-surface p-4", chargeStateTone(state).split(" ")[1], pending && "opacity-70")}>
      <div className="flex items-start gap-3">
        <Icon aria-hidden className={cn("mt-0.5 size-8 shrink-0", chargeStateTone(state).split(" ")[0])} strokeWidth={2.4} />
        <div className="min-w-0">
          <h2 className="text-xl font-semibold" data-testid="charge-state">
            {text.title}
          </h2>
          {state !== "insufficient-data" && <p className="text-sm text-muted">{confidenceWords(result.confidence)}</p>}
          <p className="mt-1">{text.nextStep}</p>
          {alternatives.length > 0 && (
            <p className="mt-1 text-sm text-muted">
              Also possible:{" "}
              {alternatives.map((alternative) => `${chargeStateText[alternative.state].title} (${Math.round(alternative.confidence * 100)} %)`).join("; ")}
            </p>
          )}
          <ChargeEstimate result={result} />
        </div>
      </div>

      {result.warnings.length > 0 && (
        <ul className="mt-3 space-y-2" aria-label="Warnings about the readings">
          {result.warnings.map((warning) => {
            const severity = SEVERITY[warning.severity];
            return (
              <li key={warning.code} className={cn("flex gap-2 rounded-card border-2 p-2", severity.tone)}>
                <severity.icon aria-hidden className="mt-0.5 size-5 shrink-0" />
                <div>
                  <p className="font-medium">
                    {severity.word}: <span className="text-ink">{warning.message}</span>
                  </p>
                  <p className="text-xs text-muted">{warning.source}</p>
                </div>
              </li>
            );
          })}
        </ul>
      )}

      {result.findings.length > 0 && (
        <details className="mt-3" open={evidenceOpen}>
          <summary className="min-h-touch cursor-pointer py-2 font-medium">What this rests on ({result.findings.length})</summary>
          <ul className="space-y-2" aria-label="Evidence">
            {result.findings.map((finding) => {
              const direction = DIRECTION[finding.direction];
              return (
                <li key={`${finding.ruleId}-${finding.reading}`} className="flex gap-2 border-t border-rule pt-2">
                  <direction.icon aria-hidden className="mt-0.5 size-5 shrink-0 text-muted" />
                  <div>
                    <p>
                      <span className="sr-only">{direction.word}: </span>
                      {finding.message}
                    </p>
                    <p className="text-xs text-muted">Rule: {finding.source}</p>
                  </div>
                </li>
              );
            })}
          </ul>
        </details>
      )}
    </section>
  );
}
