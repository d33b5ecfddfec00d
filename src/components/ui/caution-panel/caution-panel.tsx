import { TriangleAlert } from "lucide-react";
import { cautions, DEFER_TO_CODES, type CautionTopic } from "@shared/content/cautions.ts";

/** A caution with its points and source; shown beside any step that can hurt someone. */
export function CautionPanel({ topic, compact = false }: { topic: CautionTopic; compact?: boolean }) {
  const caution = cautions[topic];
  return (
    <section aria-label={`Caution: ${caution.title}`} className="rounded-card border-2 border-caution bg-surface p-4">
      <h3 className="flex items-center gap-2 font-semibold text-caution">
        <TriangleAlert aria-hidden className="size-5 shrink-0" />
        <span>Caution — {caution.title}</span>
      </h3>
      <ul className="mt-2 list-disc space-y-1 pl-6">
        {(compact ? caution.points.slice(0, 3) : caution.points).map((point) => (
          <li key={point}>{point}</li>
        ))}
      </ul>
      {!compact && <p className="mt-2 text-sm text-muted">Source: {caution.source}</p>}
    </section>
  );
}

export function DeferToCodes() {
  return <p className="text-sm text-muted">{DEFER_TO_CODES}</p>;
}
