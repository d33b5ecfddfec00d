import { OutboxList } from "@/features/outbox/components/outbox-list.tsx";
import { useOutbox } from "@/lib/api/outbox.ts";

export default function OutboxRoute() {
  const outbox = useOutbox();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-3xl font-semibold">Outbox</h1>
        <p className="mt-1 text-muted">
          Development only: mail caught by the built-in mail server instead of being delivered. Set SMTP_HOST to send
          real mail.
        </p>
      </header>
      {outbox.isPending && <p>Loading mail…</p>}
      {outbox.isError && (
        <p role="alert" className="font-medium text-fault">
          ⚠ {outbox.error.message}
        </p>
      )}
      {outbox.isSuccess && <OutboxList messages={outbox.data} />}
    </div>
  );
}
