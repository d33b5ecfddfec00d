import type { CautionTopic } from "@shared/content/cautions.ts";
import { CautionPanel, DeferToCodes } from "@/components/ui/caution-panel/caution-panel.tsx";

const TOPICS: CautionTopic[] = [
  "electrical",
  "flammable",
  "toxic",
  "nitrogen",
  "pressure",
  "liquid-refrigerant",
  "recovery-cylinder",
  "height",
  "hot-surface",
];

export default function SafetyRoute() {
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-semibold">Safety on the job</h1>
      <DeferToCodes />
      <div className="grid gap-4 lg:grid-cols-2">
        {TOPICS.map((topic) => (
          <div key={topic} id={topic} className="scroll-mt-4">
            <CautionPanel topic={topic} />
          </div>
        ))}
      </div>
    </div>
  );
}
