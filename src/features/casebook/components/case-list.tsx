import { CircleCheck, FilePen } from "lucide-react";
import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import {
  CASE_DIFFICULTIES,
  DIFFICULTY_LABELS,
  type CaseDifficulty,
  type CaseSummary,
} from "@shared/schemas/casebook.ts";
import { SelectField } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { paths } from "@/config/paths.ts";
import { METERING_LABELS } from "../utils/case-readings.ts";

const SOURCE_WORDS = { "built-in": "Satura library", organisation: "Your company", generated: "Practice" } as const;

/** The library: filter by difficulty and refrigerant; each case says whether you have solved it. */
export function CaseList({ cases }: { cases: CaseSummary[] }) {
  const [difficulty, setDifficulty] = useState<CaseDifficulty | "all">("all");
  const [refrigerant, setRefrigerant] = useState("all");
  const refrigerants = useMemo(() => [...new Set(cases.map((item) => item.refrigerant))].sort(), [cases]);
  const shown = cases.filter(
    (item) =>
      (difficulty === "all" || item.difficulty === difficulty) &&
      (refrigerant === "all" || item.refrigerant === refrigerant),
  );
  const order = (item: CaseSummary) => CASE_DIFFICULTIES.indexOf(item.difficulty);
  return (
    <section aria-labelledby="library-heading" className="space-y-3">
      <h2 id="library-heading" className="text-xl font-semibold">
        Cases
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <p className="font-medium">Difficulty</p>
          <Segmented<CaseDifficulty | "all">
            label="Difficulty"
            value={difficulty}
            onChange={setDifficulty}
            className="flex-wrap"
            options={[
              { value: "all", label: "All" },
              ...CASE_DIFFICULTIES.map((value) => ({ value, label: DIFFICULTY_LABELS[value] })),
            ]}
          />
        </div>
        <div className="w-48">
          <SelectField label="Refrigerant" value={refrigerant} onChange={(event) => setRefrigerant(event.target.value)}>
            <option value="all">All refrigerants</option>
            {refrigerants.map((id) => (
              <option key={id} value={id}>
                {id}
              </option>
            ))}
          </SelectField>
        </div>
      </div>
      <p className="text-sm text-muted" role="status">
        {shown.length} of {cases.length} cases
      </p>
      <ul className="grid gap-3 md:grid-cols-2">
        {[...shown]
          .sort((a, b) => order(a) - order(b))
          .map((item) => (
            <li key={item.id}>
              <Link
                to={paths.casebook.case.getHref(item.id)}
                className="flex h-full min-h-touch flex-col gap-1 rounded-card border-2 border-rule bg-surface p-4 hover:border-ink focus-visible:border-ink"
              >
                <span className="flex flex-wrap items-center gap-2 text-sm">
                  <span className="rounded-md border-2 border-rule px-2 font-medium">
                    {DIFFICULTY_LABELS[item.difficulty]}
                  </span>
                  <span className="num font-semibold">{item.refrigerant}</span>
                  <span className="text-muted">{METERING_LABELS[item.meteringDevice]}</span>
                  {item.status === "draft" && (
                    <span className="inline-flex items-center gap-1 rounded-md border-2 border-caution px-2 font-medium text-caution">
                      <FilePen aria-hidden className="size-4" /> Draft
                    </span>
                  )}
                </span>
                <span className="text-lg font-semibold">{item.title}</span>
                <span className="text-sm text-muted">
                  {SOURCE_WORDS[item.source]} · {item.site}
                </span>
                <span className="mt-auto pt-1 text-sm">
                  {item.solved ? (
                    <span className="inline-flex items-center gap-1 font-medium text-good">
                      <CircleCheck aria-hidden className="size-4" /> Solved
                    </span>
                  ) : item.attempts > 0 ? (
                    `${item.attempts} attempt${item.attempts === 1 ? "" : "s"}, not all right yet`
                  ) : (
                    "Not tried yet"
                  )}
                </span>
              </Link>
            </li>
          ))}
      </ul>
    </section>
  );
}
