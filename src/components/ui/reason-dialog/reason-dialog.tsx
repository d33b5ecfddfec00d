import { zodResolver } from "@hookform/resolvers/zod";
import type { LucideIcon } from "lucide-react";
import { useId, useRef, useState, type ReactNode } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button/button.tsx";
import { ModalForm } from "@/components/ui/modal-form/modal-form.tsx";

interface ReasonDialogProps<Body> {
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
  /** The body as the server checks it, made of the reason typed: its messages are the dialog's. */
  schema: z.ZodType<Body, { reason: string }>;
  /** Acts on the checked body; the dialog closes when it is done, or shows the message of what it throws. */
  onConfirm: (body: Body) => Promise<unknown>;
}

/**
 * A destructive action that needs a reason (void a record, clear a reference point): a native
 * modal dialog that asks why, keeps the keyboard inside and closes on Escape. The record stays,
 * with the reason, wherever it is kept.
 */
export function ReasonDialog<Body>({
  trigger,
  title,
  explanation,
  maxLength,
  confirmLabel,
  pendingLabel,
  schema,
  onConfirm,
}: ReasonDialogProps<Body>) {
  const dialog = useRef<HTMLDialogElement>(null);
  const form = useForm({ resolver: zodResolver(schema), defaultValues: { reason: "" } });
  // One message at a time, above the buttons: the schema's or the server's.
  const [error, setError] = useState<string | null>(null);
  const pending = form.formState.isSubmitting;
  const id = useId();
  const Icon = trigger.icon;

  const open = () => {
    form.reset();
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = () => {
    setError(null);
    return form.handleSubmit(
      async (body) => {
        try {
          await onConfirm(body);
          dialog.current?.close();
        } catch (caught) {
          setError(caught instanceof Error ? caught.message : "Not done: try again");
        }
      },
      (errors) => setError(errors.reason?.message ?? "Not done: try again"),
    )();
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
            {...form.register("reason")}
            aria-invalid={error ? true : undefined}
            className="block w-full rounded-card border-2 border-rule bg-surface p-3"
          />
        </div>
      </ModalForm>
    </>
  );
}
