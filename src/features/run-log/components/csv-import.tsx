import { FileUp } from "lucide-react";
import { useRef, useState } from "react";
import {
  guessMapping,
  IMPORT_TARGET_LABELS,
  NO_TIME_COLUMN_MESSAGE,
  type ColumnMapping,
  type ColumnTarget,
  type ImportSummary,
} from "@shared/schemas/readings-import.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { useImportReadings } from "@/lib/api/visits.ts";
import { previewCsvFile, type CsvPreview } from "../utils/csv-preview.ts";

const MAX_PROBLEMS_SHOWN = 50;

/**
 * Brings a logged series in from CSV: choose the file, check how its columns map against its
 * first rows (read here, in the browser: changing a column sends nothing), then import. The file
 * goes to the server once, with the mapping; the server judges every row and stores all of them
 * or none. When some rows have problems it lists each by line, and the valid ones can be
 * imported on their own, explicitly.
 */
export function CsvImport({ visitId, circuit }: { visitId: string; circuit: number }) {
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<CsvPreview | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping>({});
  /** The server's answer to an import that stored nothing because rows had problems. */
  const [refused, setRefused] = useState<ImportSummary | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const importReadings = useImportReadings();

  const reset = () => {
    setFile(null);
    setPreview(null);
    setRefused(null);
    if (fileInput.current) fileInput.current.value = "";
  };

  const choose = async (chosen: File | null) => {
    reset();
    setError(null);
    setDone(null);
    if (!chosen) return;
    try {
      const read = await previewCsvFile(chosen);
      if (read.headers.length === 0) return setError("The file is empty");
      setFile(chosen);
      setPreview(read);
      setMapping(guessMapping(read.headers));
    } catch (caught) {
      setError(
        caught instanceof Error ? `The file could not be read: ${caught.message}` : "The file could not be read",
      );
    }
  };

  const send = async (mode: "all" | "valid-only") => {
    if (!file) return;
    setError(null);
    setDone(null);
    try {
      const result = await importReadings.mutateAsync({ visitId, file, circuit, mode, mapping });
      if (result.stored > 0) {
        setDone(`${result.stored} reading(s) imported into circuit ${circuit}`);
        reset();
      } else if (result.problems.length > 0) {
        setRefused(result);
        setError(`${result.problems.length} row(s) have problems: nothing was stored`);
      } else {
        setError("The file has no readings under its header: nothing was stored");
      }
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The file could not be read");
    }
  };

  const timeMapped = Object.values(mapping).includes("takenAt");
  const problems = refused?.problems ?? [];
  const pending = importReadings.isPending;
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
        onChange={(event) => void choose(event.target.files?.[0] ?? null)}
      />
      <Button variant="secondary" onClick={() => fileInput.current?.click()} disabled={pending}>
        <FileUp aria-hidden className="size-5" /> {file ? `Choose another file (${file.name})` : "Choose a CSV file"}
      </Button>
      {done && <FormAlert tone="good">{done}</FormAlert>}
      {error && <FormAlert>{error}</FormAlert>}
      {preview && (
        <div className="space-y-3">
          <fieldset className="grid gap-2 sm:grid-cols-2">
            <legend className="mb-1 font-medium">Columns</legend>
            {preview.headers.map((header, column) => (
              <label key={column} className="flex flex-col text-sm">
                <span className="num">{header}</span>
                <select
                  value={mapping[header] ?? "ignore"}
                  onChange={(event) => {
                    setMapping((current) => ({ ...current, [header]: event.target.value as ColumnTarget }));
                    // The server's verdict was on the old columns.
                    setRefused(null);
                    setError(null);
                  }}
                  className="min-h-touch rounded-card border-2 border-rule bg-surface px-2"
                >
                  {Object.entries(IMPORT_TARGET_LABELS).map(([value, label]) => (
                    <option key={value} value={value}>
                      {label}
                    </option>
                  ))}
                </select>
                <span className="num text-muted">
                  {preview.rows
                    .map((row) => row[column] ?? "")
                    .filter((cell) => cell !== "")
                    .join(" · ") || "(empty in the first rows)"}
                </span>
              </label>
            ))}
          </fieldset>
          {!timeMapped && <p className="font-medium text-caution">⚠ {NO_TIME_COLUMN_MESSAGE}</p>}
          {refused && (
            <p aria-live="polite">
              <strong>{refused.validCount}</strong> of {refused.rowCount} rows are valid; {problems.length} have
              problems.
            </p>
          )}
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
            <Button onClick={() => void send("all")} disabled={pending || !timeMapped || preview.rows.length === 0}>
              Import all rows
            </Button>
            {refused && refused.validCount > 0 && (
              <Button variant="secondary" onClick={() => void send("valid-only")} disabled={pending}>
                Import the {refused.validCount} valid rows and skip {refused.rowCount - refused.validCount}
              </Button>
            )}
          </div>
        </div>
      )}
    </div>
  );
}
