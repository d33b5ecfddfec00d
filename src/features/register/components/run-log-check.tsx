import { CheckCircle2, TriangleAlert } from "lucide-react";
import type { RunLogChargeCheck } from "@shared/schemas/register.ts";
import { formatDateTime } from "@shared/format/date-time.ts";
import { formatKg } from "../utils/format-register.ts";

/**
 * The run log's charge adjustments against the register, for the visit's Refrigerant section
 * and the report. Each charge entry is one register movement with one figure, so the totals
 * agree; the line says so, or says plainly which figures differ. Adjustments stored before
 * entries were linked are named as not counted: the register's figures are the ones used.
 */
export function RunLogCheck({ check }: { check: RunLogChargeCheck }) {
  const anything = check.registerInKg + check.registerOutKg + check.runLogInKg + check.runLogOutKg > 0;
  return (
    <div className="space-y-1 text-sm" data-testid="run-log-check">
      {anything &&
        (check.agrees ? (
          <p className="flex items-start gap-2">
            <CheckCircle2 aria-hidden className="mt-0.5 size-4 shrink-0 text-good" />
            <span>
              Run log and register agree: <span className="num font-semibold">{formatKg(check.registerInKg)}</span> into
              the system, <span className="num font-semibold">{formatKg(check.registerOutKg)}</span> out of it. Each
              charge entry is one register line.
            </span>
          </p>
        ) : (
          <p role="alert" className="flex items-start gap-2 font-semibold text-fault">
            <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0" />
            <span>
              Run log and register differ: the run log shows <span className="num">{formatKg(check.runLogInKg)}</span>{" "}
              in and <span className="num">{formatKg(check.runLogOutKg)}</span> out, the register{" "}
              <span className="num">{formatKg(check.registerInKg)}</span> in and{" "}
              <span className="num">{formatKg(check.registerOutKg)}</span> out. The register's figures are used here;
              ask the office to check the records.
            </span>
          </p>
        ))}
      {check.unlinked.length > 0 && (
        <div className="flex items-start gap-2" data-testid="unlinked-run-log-entries">
          <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-caution" />
          <div>
            <p>
              {check.unlinked.length === 1 ? "One run-log entry was" : `${check.unlinked.length} run-log entries were`}{" "}
              logged without a register line (before the two were linked).{" "}
              {check.unlinked.length === 1 ? "It is" : "They are"} not counted: the figures above come from the
              register.
            </p>
            <ul className="list-disc pl-5">
              {check.unlinked.map((entry) => (
                <li key={entry.id}>
                  <span className="num">{formatDateTime(entry.at)}</span> —{" "}
                  <span className="num">{formatKg(entry.amountKg)}</span>{" "}
                  {entry.kind === "charge-added" ? "added" : "removed"}
                  {entry.circuit !== null && `, circuit ${entry.circuit}`}
                </li>
              ))}
            </ul>
          </div>
        </div>
      )}
    </div>
  );
}
