import { Send } from "lucide-react";
import { useState } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { useSendReport } from "@/lib/api/visits.ts";

const RecipientSchema = z.email("Enter an e-mail address, like facilities@example.com");

/** E-mails the report to a customer contact through the app's mail layer. */
export function SendReportForm({ visitId, defaultTo }: { visitId: string; defaultTo: string | null }) {
  const [to, setTo] = useState(defaultTo ?? "");
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const send = useSendReport();
  return (
    <form
      className="no-print space-y-2 rounded-card border-2 border-rule bg-surface p-4"
      aria-label="Send the report"
      noValidate
      onSubmit={async (event) => {
        event.preventDefault();
        setSentTo(null);
        const parsed = RecipientSchema.safeParse(to.trim());
        if (!parsed.success) return setFieldError(parsed.error.issues[0]?.message);
        setFieldError(undefined);
        try {
          await send.mutateAsync({ visitId, to: parsed.data });
          setSentTo(parsed.data);
        } catch (error) {
          setFieldError(error instanceof Error ? error.message : "The report was not sent");
        }
      }}
    >
      <TextField label="Send the report to" type="email" value={to} onChange={(event) => setTo(event.target.value)} error={fieldError} autoComplete="email" />
      <Button type="submit" disabled={send.isPending}>
        <Send aria-hidden className="size-5" /> {send.isPending ? "Sending…" : "Send report"}
      </Button>
      {sentTo && <FormAlert tone="good">Report sent to {sentTo}</FormAlert>}
    </form>
  );
}
