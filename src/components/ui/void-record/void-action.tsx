import { Ban } from "lucide-react";
import { useId, useRef, useState } from "react";
import { MAX_REASON_LENGTH } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";

interface VoidActionProps {
  /** The record in words, e.g. "the reading of 10:42 on circuit 1". */
  what: string;
  /** Voids the record with the reason; rejects with the server's message. */
  onVoid: (reason: string) => Promise<unknown>;
  disabled?: boolean;
}

const MIN_REASON = 3;

/**
 * "Void" on a record: a confirm dialog asks why (required) and says that the record stays,
 * struck through. A native modal dialog keeps the keyboard inside it and closes on Escape.
 */
export function VoidAction({ what, onVoid, disabled = false }: VoidActionProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const id = useId();

  const open = () => {
    setReason("");
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = async () => {
    if (reason.trim().length < MIN_REASON)
      return setError("Say why this record is void, e.g. “typed 3500 for 350 kPa”");
    setPending(true);
    setError(null);
    try {
      await onVoid(reason.trim());
      dialog.current?.close();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The record was not voided");
    } finally {
      setPending(false);
    }
  };

  return (
    <>
      <Button variant="quiet" onClick={open} disabled={disabled} aria-label={`Void ${what}`}>
        <Ban aria-hidden className="size-5" /> Void
      </Button>
      <dialog
        ref={dialog}
        aria-labelledby={`${id}-title`}
        className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-card border-2 border-ink bg-surface p-4 text-ink backdrop:bg-black/40"
      >
        <form
          method="dialog"
          className="space-y-3"
          onSubmit={(event) => {
            event.preventDefault();
            void confirm();
          }}
        >
          <h2 id={`${id}-title`} className="text-lg font-semibold">
            Void {what}?
          </h2>
          <p className="text-sm">
            The record stays on the visit, struck through with your reason, and is left out of results, balances and the
            report. Enter it again if it was a typing slip.
          </p>
          <div className="space-y-1">
            <label htmlFor={`${id}-reason`} className="block font-medium">
              Reason (required)
            </label>
            <textarea
              id={`${id}-reason`}
              rows={3}
              aria-required="true"
              maxLength={MAX_REASON_LENGTH}
              value={reason}
              onChange={(event) => setReason(event.target.value)}
              aria-invalid={error ? true : undefined}
              className="block w-full rounded-card border-2 border-rule bg-surface p-3"
            />
          </div>
          {error && <FormAlert>{error}</FormAlert>}
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={() => dialog.current?.close()} disabled={pending}>
              Cancel
            </Button>
            <Button type="submit" variant="danger" disabled={pending}>
              <Ban aria-hidden className="size-5" /> {pending ? "Voiding…" : "Void the record"}
            </Button>
          </div>
        </form>
      </dialog>
    </>
  );
}
