import { zodResolver } from "@hookform/resolvers/zod";
import { AlertTriangle, Send } from "lucide-react";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { SendReportSchema, VISIT_STATUS_LABELS } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { useSendReport, useVisit } from "@/lib/api/visits.ts";

/** The recipient as the server checks it (spaces around a pasted address dropped), and the tick for an unsigned report. */
const SendReportFormSchema = z.object({
  to: z.string().trim().pipe(SendReportSchema.shape.to),
  sendUnsigned: z.boolean(),
});
const UNSIGNED_CONFIRMATION_NEEDED = "Tick the box to send a report that is not signed off, or wait for the sign-off";

/**
 * E-mails the report to a customer contact through the app's mail layer. Before sign-off the
 * customer would get a report no senior has checked: the form says so and sends it only when
 * the technician has ticked that they mean it.
 */
export function SendReportForm({ visitId, defaultTo }: { visitId: string; defaultTo: string | null }) {
  const form = useForm({
    resolver: zodResolver(SendReportFormSchema),
    defaultValues: { to: defaultTo ?? "", sendUnsigned: false },
  });
  const { errors } = form.formState;
  const confirmError = errors.sendUnsigned?.message;
  const [sentTo, setSentTo] = useState<string | null>(null);
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
      onSubmit={(event) => {
        setSentTo(null);
        void form.handleSubmit(async ({ to, sendUnsigned }) => {
          if (unsigned && !sendUnsigned) {
            form.setError("sendUnsigned", { type: "confirm", message: UNSIGNED_CONFIRMATION_NEEDED });
            return;
          }
          try {
            await send.mutateAsync({ visitId, to });
            setSentTo(to);
          } catch (error) {
            form.setError("to", {
              type: "server",
              message: error instanceof Error ? error.message : "The report was not sent",
            });
          }
        })(event);
      }}
    >
      <TextField
        label="Send the report to"
        type="email"
        error={errors.to?.message}
        autoComplete="email"
        {...form.register("to")}
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
              {...form.register("sendUnsigned", {
                // Ticked or not, the request to tick it has been read.
                onChange: () => form.clearErrors("sendUnsigned"),
              })}
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
