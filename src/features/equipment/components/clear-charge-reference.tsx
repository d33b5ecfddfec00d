import { Eraser } from "lucide-react";
import { useId, useRef, useState } from "react";
import { ChargeReferenceClearSchema, MAX_CLEAR_REASON_LENGTH } from "@shared/schemas/charge-references.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { useClearChargeReference } from "@/lib/api/charge-references.ts";

/**
 * "Clear…" on a circuit's reference point: a modal dialog asks why (required; kept in the
 * history). A native dialog keeps the keyboard inside it and closes on Escape.
 */
export function ClearChargeReference({ equipmentId, circuit }: { equipmentId: string; circuit: number }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const clear = useClearChargeReference(equipmentId);
  const id = useId();

  const open = () => {
    setReason("");
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = async () => {
    // The same schema the server checks the body with.
    const parsed = ChargeReferenceClearSchema.safeParse({ reason });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Say why the reference point is cleared");
    setError(null);
    try {
      await clear.mutateAsync({ circuit, body: parsed.data });
      dialog.current?.close();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The reference point was not cleared");
    }
  };

  return (
    <>
      <Button variant="secondary" onClick={open}>
        <Eraser aria-hidden className="size-5" /> Clear…
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
            Clear circuit {circuit}&rsquo;s reference point?
          </h2>
          <p className="text-sm">
            Charge estimates on this circuit go back to generic coefficients and a wide range until it is weighed in and settles again. The reference point
            stays in the history with your reason.
          </p>
          <div className="space-y-1">
            <label htmlFor={`${id}-reason`} className="block font-medium">
              Reason (required)
            </label>
            <textarea
              id={`${id}-reason`}
              rows={3}
              aria-required="true"
              maxLength={MAX_CLEAR_REASON_LENGTH}
              value={reason}
              onChange={(event) => setReason(event.target.value)}
              aria-invalid={error ? true : undefined}
              className="block w-full rounded-card border-2 border-rule bg-surface p-3"
            />
          </div>
          {error && <FormAlert>{error}</FormAlert>}
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={() => dialog.current?.close()} disabled={clear.isPending}>
              Cancel
            </Button>
            <Button type="submit" variant="danger" disabled={clear.isPending}>
              <Eraser aria-hidden className="size-5" /> {clear.isPending ? "Clearing…" : "Clear the reference point"}
            </Button>
          </div>
        </form>
      </dialog>
    </>
  );
}
