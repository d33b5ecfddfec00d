import { useState } from "react";
import type { FieldValues, Path, UseFormReturn } from "react-hook-form";
import type { OutboxKind } from "@/features/offline/outbox-store.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { ApiError } from "@/lib/api/api-client.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";

/** Said above the save button when the shared schema (or the engine) refused what was typed. */
export const CHECK_FIELDS_MESSAGE = "Check the fields marked below";

type Sent = Record<string, unknown> & { clientId: string };

interface ProcedureSaveOptions<Typed extends FieldValues, Body, Record extends Sent> {
  /** The panel's form; its resolver turns what was typed into the body and checks it with the shared schema. */
  form: UseFormReturn<Typed, unknown, Body>;
  visitId: string;
  /** The panel's mutation (it invalidates the visit's lists); `send` calls it. */
  mutation: { isPending: boolean };
  /** The record as sent: the checked body with its client id and the moment by this device's clock. */
  record: (body: Body, clientId: string) => Record;
  /** Sends the record now; without a connection it is kept in the outbox instead (README decision 027). */
  send: (record: Record) => Promise<unknown>;
  /** The outbox entry that keeps the record when it cannot be sent. */
  entry: (record: Record) => { kind: OutboxKind; path: string; label?: string; takenAt?: string };
  /** What the form holds once the record is saved (or kept): typically the readings cleared, the choices kept. */
  cleared: (typed: Typed) => Typed;
  /** Said when the save failed without a message of its own. */
  notSaved: string;
  /** A check only the engine can make, after the schema's: a message for a field stops the save. */
  check?: (body: Body) => { field: Path<Typed>; message: string } | null;
  /** Clears the form as soon as the record is checked, so the next can be typed meanwhile; restored if it fails. */
  clearAtOnce?: boolean;
  /** What to say above the button when the schema refused the fields (null: only the fields' own messages). */
  invalidMessage?: string | null;
}

/**
 * The save of a procedure record, written once for every panel: the shared schema checks what
 * was typed (the form's resolver), the record gets one client id kept across retries so a save
 * whose answer was lost is stored once (README decision 026), it is sent or kept on the device
 * when there is no connection, the form is cleared for the next one, and a refusal puts the
 * server's messages under the fields that caused them (`fieldMessages` keys are the form's
 * field paths) with its message above the button.
 *
 * @returns `submit` for the form's onSubmit, the message above the button (and `dismiss` for it),
 * whether the last save reached the server, and whether one is being sent
 */
export function useProcedureSave<Typed extends FieldValues, Body, Record extends Sent>({
  form,
  visitId,
  mutation,
  record: makeRecord,
  send,
  entry,
  cleared,
  notSaved,
  check,
  clearAtOnce = false,
  invalidMessage = CHECK_FIELDS_MESSAGE,
}: ProcedureSaveOptions<Typed, Body, Record>) {
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const [formError, setFormError] = useState<string | null>(null);
  const [stored, setStored] = useState(false);

  const save = async (body: Body) => {
    const problem = check?.(body);
    if (problem) {
      form.setError(problem.field, { type: "engine", message: problem.message });
      setFormError(invalidMessage);
      return;
    }
    const typed = form.getValues();
    if (clearAtOnce) form.reset(cleared(typed));
    try {
      const record = makeRecord(body, entryId.take());
      const sent = await keepWhenOffline(() => send(record), { ...entry(record), visitId, body: record });
      entryId.release();
      if (!clearAtOnce) form.reset(cleared(typed));
      setStored(sent.outcome === "stored");
    } catch (error) {
      if (clearAtOnce) form.reset(typed);
      if (error instanceof ApiError) {
        for (const [path, message] of Object.entries(error.fields))
          form.setError(path as Path<Typed>, { type: "server", message });
      }
      setFormError(error instanceof Error ? error.message : notSaved);
    }
  };

  const submit = () => {
    setFormError(null);
    setStored(false);
    return form.handleSubmit(save, () => setFormError(invalidMessage))();
  };

  /** Takes the message above the button away (what it said no longer applies). */
  const dismiss = () => setFormError(null);

  return { submit, dismiss, formError, stored, pending: mutation.isPending };
}
