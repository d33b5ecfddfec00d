import type { ReactNode } from "react";
import type { CautionTopic } from "@shared/content/cautions.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";

interface ProcedureLayoutProps {
  /** The caution shown first, where the work can hurt (not every record has one). */
  caution?: CautionTopic;
  /** Records already on the visit, each rendered; the list shows only when there are some. */
  saved: { headingId: string; title: string; records: ReactNode[] };
  /** Set when the saved records could not be loaded. */
  loadError?: string;
  /** The entry form, or null for roles that only read. */
  form: { label: string; title: string; onSubmit: () => void; children: ReactNode } | null;
}

/**
 * The frame the procedure sections share: their caution first, what was recorded on this
 * visit, then the form for a new record (or a note that the role only reads).
 */
export function ProcedureLayout({ caution, saved, loadError, form }: ProcedureLayoutProps) {
  return (
    <div className="space-y-4">
      {caution && <CautionPanel topic={caution} />}
      {saved.records.length > 0 && (
        <section aria-labelledby={saved.headingId} className="space-y-2">
          <h2 id={saved.headingId} className="text-lg font-semibold">
            {saved.title}
          </h2>
          {saved.records}
        </section>
      )}
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
        <p className="text-muted">You can read this visit; recording is for technicians, seniors and owners.</p>
      )}
    </div>
  );
}
