import { AlertTriangle, Send } from "lucide-react";
import { useId, useState } from "react";
import { z } from "zod";
import { VISIT_STATUS_LABELS } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { useSendReport, useVisit } from "@/lib/api/visits.ts";

const RecipientSchema = z.email("Enter an e-mail address, like facilities@example.com");
const UNSIGNED_CONFIRMATION_NEEDED = "Tick the box to send a report that is not signed off, or wait for the sign-off";

/**
 * E-mails the report to a customer contact through the app's mail layer. Before sign-off the
 * customer would get a report no senior has checked: the form says so and sends it only when
 * the technician has ticked that they mean it.
 */
export function SendReportForm({ visitId, defaultTo }: { visitId: string; defaultTo: string | null }) {
  const [to, setTo] = useState(defaultTo ?? "");
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [sendUnsigned, setSendUnsigned] = useState(false);
  const [confirmError, setConfirmError] = useState<string | null>(null);
  const send = useSendReport();
  // The same cached visit the report page shows (and refreshes), so a sign-off meanwhile counts.
  const visit = useVisit(visitId);
  const unsigned = visit.data ? visit.data.status !== "signed-off" : true;
  const confirmId = useId();
  return (
    <form
      className="no-print space-y-2 rounded-card border-2 border-rule bg-surface p-4"
      aria-label="Send the report"
      noValidate
      onSubmit={async (event) => {
        event.preventDefault();
        setSentTo(null);
        setConfirmError(null);
        const parsed = RecipientSchema.safeParse(to.trim());
        if (!parsed.success) return setFieldError(parsed.error.issues[0]?.message);
        setFieldError(undefined);
        if (unsigned && !sendUnsigned) return setConfirmError(UNSIGNED_CONFIRMATION_NEEDED);
        try {
          await send.mutateAsync({ visitId, to: parsed.data });
          setSentTo(parsed.data);
        } catch (error) {
          setFieldError(error instanceof Error ? error.message : "The report was not sent");
        }
      }}
    >
      <TextField
        label="Send the report to"
        type="email"
        value={to}
        onChange={(event) => setTo(event.target.value)}
        error={fieldError}
        autoComplete="email"
      />
      {unsigned && (
        <div className="space-y-2 rounded-card border-2 border-caution p-3" data-testid="unsigned-report-warning">
          <p className="flex items-start gap-2 font-medium">
            <AlertTriangle aria-hidden className="mt-0.5 size-5 shrink-0 text-caution" />
            <span>
              Not signed off{visit.data ? ` (${VISIT_STATUS_LABELS[visit.data.status].toLowerCase()})` : ""}: the
              customer will get an unsigned report, which a senior technician has not checked and which may still
              change.
            </span>
          </p>
          <label htmlFor={confirmId} className="flex min-h-touch cursor-pointer items-center gap-3">
            <input
              id={confirmId}
              type="checkbox"
              checked={sendUnsigned}
              onChange={(event) => {
                setSendUnsigned(event.target.checked);
                setConfirmError(null);
              }}
              aria-invalid={confirmError ? true : undefined}
              className="size-6 shrink-0 accent-current"
            />
            <span>Send it unsigned anyway</span>
          </label>
          {confirmError && <FormAlert>{confirmError}</FormAlert>}
        </div>
      )}
      <Button type="submit" disabled={send.isPending}>
        <Send aria-hidden className="size-5" />{" "}
        {send.isPending ? "Sending…" : unsigned ? "Send unsigned report" : "Send report"}
      </Button>
      {sentTo && (
        <FormAlert tone="good">{unsigned ? `Unsigned report sent to ${sentTo}` : `Report sent to ${sentTo}`}</FormAlert>
      )}
    </form>
  );
}
