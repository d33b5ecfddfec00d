import { useId, type ReactNode } from "react";
import { Save } from "lucide-react";
import { formatTime } from "@shared/format/date-time.ts";
import type { CautionTopic } from "@shared/content/cautions.ts";
import type { VoidableKind, VoidInfo } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { VoidedRecord } from "@/components/ui/void-record/voided-record.tsx";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";
import type { ProcedureSave } from "../hooks/use-procedure-save.ts";
import { ROLE_READ_ONLY_NOTE } from "../utils/read-only-note.ts";

/** A saved record as each procedure's list returns it: voidable, and named by the time it was taken. */
interface TimedRecord {
  id: string;
  voided: VoidInfo;
  takenAt: string;
}

/** What the visit screen gives every procedure panel, which hands it on to its layout. */
export interface ProcedurePanelProps {
  visitId: string;
  /** Whether records can be made and voided (the role, and an open visit); without it the note says why not. */
  canWrite: boolean;
  /** Why there is no form; the role's note by default. */
  readOnlyNote?: string;
}

interface ProcedureLayoutProps<Saved extends TimedRecord> extends ProcedurePanelProps {
  /** What the section records: the kind its voids name, and of the entries waiting on the device. */
  kind: VoidableKind;
  /** The caution shown first, where the work can hurt (not every record has one). */
  caution?: CautionTopic;
  /**
   * Records already on the visit; the list shows only when there are some. Voided ones stay,
   * struck through with their reason; the others can be voided while the visit is open.
   */
  saved: {
    title: string;
    /** Undefined until they load. */
    records: Saved[] | undefined;
    /** What the void dialog calls a record, before its time: "the pressure test" → "the pressure test of 10:42". */
    name: string;
    view: (record: Saved) => ReactNode;
  };
  /** Set when the saved records could not be loaded. */
  loadError?: string;
  /** The entry form, saved by the section's `useProcedureSave`. */
  form: {
    label: string;
    /** The heading, when it says more than the label. */
    title?: string;
    save: ProcedureSave;
    /** The submit button's words, e.g. "Save pressure test". */
    saveLabel: string;
    /** Said beside the button once the server has stored the record. */
    storedNote?: string;
    children: ReactNode;
  };
}

/**
 * The frame the procedure sections share: their caution first, what was recorded on this
 * visit, then the form for a new record (or a note that the role only reads). The form ends the
 * same way in every section, so it is drawn here: the save's message above the button, and the
 * button saying when it is saving.
 */
export function ProcedureLayout<Saved extends TimedRecord>({
  visitId,
  kind,
  caution,
  canWrite,
  readOnlyNote = ROLE_READ_ONLY_NOTE,
  saved,
  loadError,
  form,
}: ProcedureLayoutProps<Saved>) {
  const onDevice = useOutboxEntries();
  const headingId = useId();
  const records = saved.records ?? [];
  const { save } = form;
  const button = (
    <Button type="submit" size="lg" disabled={save.pending}>
      <Save aria-hidden className="size-5" /> {save.pending ? "Saving…" : form.saveLabel}
    </Button>
  );
  return (
    <div className="space-y-4">
      {caution && <CautionPanel topic={caution} />}
      {records.length > 0 && (
        <section aria-labelledby={headingId} className="space-y-2">
          <h2 id={headingId} className="text-lg font-semibold">
            {saved.title}
          </h2>
          {records.map((record) => (
            <div key={record.id} className="space-y-1">
              <VoidedRecord voided={record.voided}>{saved.view(record)}</VoidedRecord>
              {canWrite && !record.voided && (
                <VisitVoidAction
                  visitId={visitId}
                  kind={kind}
                  recordId={record.id}
                  what={`${saved.name} of ${formatTime(record.takenAt)}`}
                />
              )}
            </div>
          ))}
        </section>
      )}
      {/* This kind's entries on the device: waiting to send, or refused with the reason. */}
      <WaitingEntries
        entries={onDevice.filter(
          (entry) => entry.visitId === visitId && (entry.kind === kind || entry.kind.startsWith(`${kind}-`)),
        )}
      />
      {loadError && <FormAlert>{loadError}</FormAlert>}
      {canWrite ? (
        <form
          aria-label={form.label}
          noValidate
          className="space-y-4 rounded-card border-2 border-rule bg-surface p-4"
          onSubmit={(event) => {
            event.preventDefault();
            void save.submit();
          }}
        >
          <h2 className="text-lg font-semibold">{form.title ?? form.label}</h2>
          {form.children}
          {save.formError && <FormAlert>{save.formError}</FormAlert>}
          {form.storedNote ? (
            <div className="flex flex-wrap items-center gap-3">
              {button}
              {save.stored && (
                <span role="status" className="text-sm text-muted">
                  {form.storedNote}
                </span>
              )}
            </div>
          ) : (
            button
          )}
        </form>
      ) : (
        <p className="text-muted">{readOnlyNote}</p>
      )}
    </div>
  );
}

/**
 * Which of the unit's circuits a check was made on: one choice, worded the same on every procedure
 * that records a circuit (callers show it only where there is more than one). It lives beside the
 * frame, and takes its value rather than the form, so that the code the sections share stays one
 * file that a visit's first screen can load without the forms' package.
 */
export function CircuitChoice({
  circuits,
  value,
  onChange,
}: {
  circuits: number[];
  /** The circuit's number as text, as the form holds it. */
  value: string;
  onChange: (value: string) => void;
}) {
  return (
    <Segmented<string>
      label="Circuit"
      value={value}
      onChange={onChange}
      options={circuits.map((number) => ({ value: String(number), label: `Circuit ${number}` }))}
    />
  );
}
