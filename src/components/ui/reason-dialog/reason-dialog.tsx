import type { LucideIcon } from "lucide-react";
import { useId, useRef, useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button/button.tsx";
import { ModalForm } from "@/components/ui/modal-form/modal-form.tsx";

interface ReasonDialogProps {
  /** The button that opens the dialog. */
  trigger: {
    label: ReactNode;
    icon: LucideIcon;
    variant: "secondary" | "quiet";
    ariaLabel?: string;
    disabled?: boolean;
  };
  title: ReactNode;
  /** What happens to the record, in a sentence or two. */
  explanation: ReactNode;
  maxLength: number;
  confirmLabel: string;
  pendingLabel: string;
  /**
   * Checks the reason and acts on it: returns an error message to show (the dialog stays open)
   * or null when done (it closes). A thrown error's message is shown as well.
   */
  onConfirm: (reason: string) => Promise<string | null>;
}

/**
 * A destructive action that needs a reason (void a record, clear a reference point): a native
 * modal dialog that asks why, keeps the keyboard inside and closes on Escape. The record stays,
 * with the reason, wherever it is kept.
 */
export function ReasonDialog({
  trigger,
  title,
  explanation,
  maxLength,
  confirmLabel,
  pendingLabel,
  onConfirm,
}: ReasonDialogProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const id = useId();
  const Icon = trigger.icon;

  const open = () => {
    setReason("");
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = async () => {
    setPending(true);
    setError(null);
    try {
      const problem = await onConfirm(reason);
      if (problem) setError(problem);
      else dialog.current?.close();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "Not done: try again");
    } finally {
      setPending(false);
    }
  };

  return (
    <>
      <Button variant={trigger.variant} onClick={open} disabled={trigger.disabled} aria-label={trigger.ariaLabel}>
        <Icon aria-hidden className="size-5" /> {trigger.label}
      </Button>
      <ModalForm
        dialogRef={dialog}
        title={title}
        explanation={explanation}
        error={error}
        pending={pending}
        submit={
          <>
            <Icon aria-hidden className="size-5" /> {pending ? pendingLabel : confirmLabel}
          </>
        }
        submitVariant="danger"
        onSubmit={() => void confirm()}
      >
        <div className="space-y-1">
          <label htmlFor={`${id}-reason`} className="block font-medium">
            Reason (required)
          </label>
          <textarea
            id={`${id}-reason`}
            rows={3}
            aria-required="true"
            maxLength={maxLength}
            value={reason}
            onChange={(event) => setReason(event.target.value)}
            aria-invalid={error ? true : undefined}
            className="block w-full rounded-card border-2 border-rule bg-surface p-3"
          />
        </div>
      </ModalForm>
    </>
  );
}
