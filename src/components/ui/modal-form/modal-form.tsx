import { useId, type ReactNode, type RefObject } from "react";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";

interface ModalFormProps {
  /** The native dialog: its owner opens it with showModal() and resets its own fields first. */
  dialogRef: RefObject<HTMLDialogElement | null>;
  title: ReactNode;
  /** What confirming does, in a sentence or two. */
  explanation: ReactNode;
  error: string | null;
  pending: boolean;
  /** The submit button's content (icon and words) and its weight. */
  submit: ReactNode;
  submitVariant?: "primary" | "danger";
  onSubmit: () => void;
  /** The fields between the explanation and the buttons. */
  children: ReactNode;
}

/**
 * The frame of every confirm-with-details dialog: a native modal (keyboard kept inside, Escape
 * closes it) holding a titled form, its error and Cancel beside the action.
 */
export function ModalForm({
  dialogRef,
  title,
  explanation,
  error,
  pending,
  submit,
  submitVariant = "primary",
  onSubmit,
  children,
}: ModalFormProps) {
  const id = useId();
  return (
    <dialog
      ref={dialogRef}
      aria-labelledby={`${id}-title`}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-card border-2 border-ink bg-surface p-4 text-ink backdrop:bg-black/40"
    >
      <form
        method="dialog"
        className="space-y-3"
        onSubmit={(event) => {
          event.preventDefault();
          onSubmit();
        }}
      >
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          {title}
        </h2>
        <p className="text-sm">{explanation}</p>
        {children}
        {error && <FormAlert>{error}</FormAlert>}
        <div className="flex flex-wrap justify-end gap-2">
          <Button variant="secondary" onClick={() => dialogRef.current?.close()} disabled={pending}>
            Cancel
          </Button>
          <Button type="submit" variant={submitVariant} disabled={pending}>
            {submit}
          </Button>
        </div>
      </form>
    </dialog>
  );
}
