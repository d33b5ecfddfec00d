import { FileUp } from "lucide-react";
import { useRef, useState } from "react";
import { IMPORT_TARGET_LABELS, type ImportSummary } from "@shared/schemas/readings-import.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { useImportReadings } from "@/lib/api/visits.ts";

const MAX_PROBLEMS_SHOWN = 50;

/**
 * Brings a logged series in from CSV: choose the file, check how its columns map, read every
 * problem by line number, then store all rows — or, explicitly, only the valid ones.
 */
export function CsvImport({ visitId, circuit }: { visitId: string; circuit: number }) {
  const [file, setFile] = useState<File | null>(null);
  const [summary, setSummary] = useState<ImportSummary | null>(null);
  const [mapping, setMapping] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const importReadings = useImportReadings();

  const run = async (
    mode: "preview" | "all" | "valid-only",
    chosen: File | null = file,
    columns: Record<string, string> | undefined = summary ? mapping : undefined,
  ) => {
    if (!chosen) return;
    setError(null);
    setDone(null);
    try {
      const result = await importReadings.mutateAsync({ visitId, file: chosen, circuit, mode, mapping: columns });
      setSummary(result);
      setMapping(result.mapping);
      if (result.stored > 0) {
        setDone(`${result.stored} reading(s) imported into circuit ${circuit}`);
        setFile(null);
        setSummary(null);
        if (fileInput.current) fileInput.current.value = "";
      } else if (mode !== "preview" && result.problems.length > 0) {
        setError(`${result.problems.length} row(s) have problems: nothing was stored`);
      }
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The file could not be read");
    }
  };

  const problems = summary?.problems ?? [];
  return (
    <div className="space-y-3">
      <p className="text-sm text-muted">
        Columns in SI-metric: pressures in kPa gauge, temperatures in °C. Times as 2026-03-14T10:05 or 10:05 (today).
      </p>
      <input
        ref={fileInput}
        id={`csv-${circuit}`}
        type="file"
        aria-label="CSV file"
        tabIndex={-1}
        accept=".csv,text/csv"
        className="sr-only"
        onChange={(event) => {
          const chosen = event.target.files?.[0] ?? null;
          setFile(chosen);
          setSummary(null);
          void run("preview", chosen, undefined);
        }}
      />
      <Button variant="secondary" onClick={() => fileInput.current?.click()} disabled={importReadings.isPending}>
        <FileUp aria-hidden className="size-5" /> {file ? `Choose another file (${file.name})` : "Choose a CSV file"}
      </Button>
      {done && <FormAlert tone="good">{done}</FormAlert>}
      {error && <FormAlert>{error}</FormAlert>}
      {summary && summary.headers.length > 0 && (
        <div className="space-y-3">
          <fieldset className="grid gap-2 sm:grid-cols-2">
            <legend className="mb-1 font-medium">Columns</legend>
            {summary.headers.map((header) => (
              <label key={header} className="flex flex-col text-sm">
                <span className="num">{header}</span>
                <select
                  value={mapping[header] ?? "ignore"}
                  onChange={(event) => setMapping((current) => ({ ...current, [header]: event.target.value }))}
                  className="min-h-touch rounded-card border-2 border-rule bg-surface px-2"
                >
                  {Object.entries(IMPORT_TARGET_LABELS).map(([value, label]) => (
                    <option key={value} value={value}>
                      {label}
                    </option>
                  ))}
                </select>
              </label>
            ))}
          </fieldset>
          <Button variant="quiet" onClick={() => void run("preview")} disabled={importReadings.isPending}>
            Check again with these columns
          </Button>
          <p aria-live="polite">
            <strong>{summary.validCount}</strong> of {summary.rowCount} rows are valid
            {problems.length > 0 && <>; {problems.length} have problems</>}.
          </p>
          {problems.length > 0 && (
            <ul
              aria-label="Problems by line"
              className="max-h-60 space-y-1 overflow-auto rounded-card border-2 border-fault p-2 text-sm"
            >
              {problems.slice(0, MAX_PROBLEMS_SHOWN).map((problem) => (
                <li key={`${problem.line}-${problem.field ?? ""}`}>
                  <span className="num font-semibold">Line {problem.line}</span>: {problem.message}
                </li>
              ))}
              {problems.length > MAX_PROBLEMS_SHOWN && <li>…and {problems.length - MAX_PROBLEMS_SHOWN} more</li>}
            </ul>
          )}
          <div className="flex flex-wrap gap-2">
            <Button
              onClick={() => void run("all")}
              disabled={importReadings.isPending || problems.length > 0 || summary.validCount === 0}
            >
              Import all {summary.validCount} rows
            </Button>
            {problems.length > 0 && summary.validCount > 0 && (
              <Button variant="secondary" onClick={() => void run("valid-only")} disabled={importReadings.isPending}>
                Import the {summary.validCount} valid rows and skip {summary.rowCount - summary.validCount}
              </Button>
            )}
          </div>
        </div>
      )}
    </div>
  );
}
