import type { ReactNode } from "react";
import type { CautionTopic } from "@shared/content/cautions.ts";
import type { VoidableKind, VoidInfo } from "@shared/schemas/visits.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { VoidedRecord } from "@/components/ui/void-record/voided-record.tsx";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";

/** One saved record: how it looks, and what the void dialog calls it. */
export interface SavedRecord {
  id: string;
  voided: VoidInfo;
  /** e.g. "the pressure test of 10:42". */
  what: string;
  element: ReactNode;
}

interface ProcedureLayoutProps {
  visitId: string;
  /** The caution shown first, where the work can hurt (not every record has one). */
  caution?: CautionTopic;
  /**
   * Records already on the visit; the list shows only when there are some. Voided ones stay,
   * struck through with their reason; the others can be voided while the visit is open.
   */
  saved: { headingId: string; title: string; kind: VoidableKind; canVoid: boolean; records: SavedRecord[] };
  /** Set when the saved records could not be loaded. */
  loadError?: string;
  /** The entry form, or null when nothing can be recorded (the role, or a closed visit). */
  form: { label: string; title: string; onSubmit: () => void; children: ReactNode } | null;
  /** Why there is no form; the role's note by default. */
  readOnlyNote?: string;
}

/**
 * The frame the procedure sections share: their caution first, what was recorded on this
 * visit, then the form for a new record (or a note that the role only reads).
 */
export const ROLE_READ_ONLY_NOTE = "You can read this visit; recording is for technicians, seniors and owners.";

export function ProcedureLayout({
  visitId,
  caution,
  saved,
  loadError,
  form,
  readOnlyNote = ROLE_READ_ONLY_NOTE,
}: ProcedureLayoutProps) {
  const onDevice = useOutboxEntries();
  return (
    <div className="space-y-4">
      {caution && <CautionPanel topic={caution} />}
      {saved.records.length > 0 && (
        <section aria-labelledby={saved.headingId} className="space-y-2">
          <h2 id={saved.headingId} className="text-lg font-semibold">
            {saved.title}
          </h2>
          {saved.records.map((record) => (
            <div key={record.id} className="space-y-1">
              <VoidedRecord voided={record.voided}>{record.element}</VoidedRecord>
              {saved.canVoid && !record.voided && (
                <VisitVoidAction visitId={visitId} kind={saved.kind} recordId={record.id} what={record.what} />
              )}
            </div>
          ))}
        </section>
      )}
      {/* This kind's entries on the device: waiting to send, or refused with the reason. */}
      <WaitingEntries
        entries={onDevice.filter(
          (entry) =>
            entry.visitId === visitId && (entry.kind === saved.kind || entry.kind.startsWith(`${saved.kind}-`)),
        )}
      />
      {loadError && <FormAlert>{loadError}</FormAlert>}
      {form ? (
        <form
          aria-label={form.label}
          noValidate
          className="space-y-4 rounded-card border-2 border-rule bg-surface p-4"
          onSubmit={(event) => {
            event.preventDefault();
            form.onSubmit();
          }}
        >
          <h2 className="text-lg font-semibold">{form.title}</h2>
          {form.children}
        </form>
      ) : (
        <p className="text-muted">{readOnlyNote}</p>
      )}
    </div>
  );
}
