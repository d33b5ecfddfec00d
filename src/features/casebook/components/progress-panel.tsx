import { chargeStateText } from "@shared/content/charge-states.ts";
import type { Progress, ProgressGroup } from "@shared/schemas/casebook.ts";
import type { ChargeState } from "@shared/schemas/diagnosis.ts";

function percent(right: number, total: number): string {
  return total === 0 ? "–" : `${Math.round((100 * right) / total)} %`;
}

function GroupTable({
  caption,
  groups,
  label,
}: {
  caption: string;
  groups: ProgressGroup[];
  label: (key: string) => string;
}) {
  return (
    <table className="w-full text-left">
      <caption className="mb-1 text-left font-semibold">{caption}</caption>
      <thead>
        <tr className="text-sm text-muted">
          <th scope="col" className="py-1 pr-2 font-medium">
            {caption.startsWith("By charge") ? "State" : "Refrigerant"}
          </th>
          <th scope="col" className="py-1 pr-2 text-right font-medium">
            Tried
          </th>
          <th scope="col" className="py-1 pr-2 text-right font-medium">
            All right
          </th>
          <th scope="col" className="py-1 text-right font-medium">
            Answers right
          </th>
        </tr>
      </thead>
      <tbody>
        {groups.map((group) => (
          <tr key={group.key} className="border-t border-rule">
            <th scope="row" className="py-2 pr-2 font-normal">
              {label(group.key)}
            </th>
            <td className="num py-2 pr-2 text-right">{group.attempts}</td>
            <td className="num py-2 pr-2 text-right">{group.solved}</td>
            <td className="num py-2 text-right">{percent(group.answersRight, group.answersTotal)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Attempts by charge state and by refrigerant, in words and figures (no colour-only bars). */
export function ProgressPanel({ progress, title = "Your progress" }: { progress: Progress; title?: string }) {
  return (
    <section aria-label={title} className="space-y-3 rounded-card border-2 border-rule bg-surface p-4">
      <h2 className="text-xl font-semibold">{title}</h2>
      {progress.attempts === 0 ? (
        <p className="text-muted">No attempts yet. Pick a starter case below.</p>
      ) : (
        <>
          <p>
            <span className="num font-semibold">{progress.solved}</span> of{" "}
            <span className="num font-semibold">{progress.attempts}</span> attempts all right.
          </p>
          <div className="grid gap-4 md:grid-cols-2">
            <GroupTable
              caption="By charge state"
              groups={progress.byState}
              label={(key) => chargeStateText[key as ChargeState]?.title ?? key}
            />
            <GroupTable caption="By refrigerant" groups={progress.byRefrigerant} label={(key) => key} />
          </div>
        </>
      )}
    </section>
  );
}
