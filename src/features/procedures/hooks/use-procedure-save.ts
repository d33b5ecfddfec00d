import { useState } from "react";
import type { FieldValues, Path, UseFormReturn } from "react-hook-form";
import type { OutboxKind } from "@/features/offline/outbox-store.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { ApiError } from "@/lib/api/api-client.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";

/** Said above the save button when the shared schema (or the engine) refused what was typed. */
export const CHECK_FIELDS_MESSAGE = "Check the fields marked below";

type Sent = Record<string, unknown> & { clientId: string };

/** The moment a record carries, by this device's clock: a test's or check's `takenAt`, an evacuation's `startedAt`. */
type Stamp = "takenAt" | "startedAt";
/** A record as most panels send it: the checked body, its client id and the moment it was saved. */
type Stamped<Body, S extends Stamp> = Body & { clientId: string } & Record<S, string>;

interface SaveOptions<Typed extends FieldValues, Body, Item extends Sent> {
  /** The panel's form; its resolver turns what was typed into the body and checks it with the shared schema. */
  form: UseFormReturn<Typed, unknown, Body>;
  visitId: string;
  /** The outbox entry that keeps the record when it cannot be sent. */
  entry: (record: Item) => { kind: OutboxKind; path: string; label?: string; takenAt?: string };
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

/** A record of a visit's own: the body stamped with the moment it is saved, sent with the panel's mutation. */
interface StampedSaveOptions<Typed extends FieldValues, Body, S extends Stamp> extends SaveOptions<
  Typed,
  Body,
  Stamped<Body, S>
> {
  /**
   * The field that takes the moment of the save by this device's clock: without a connection the
   * record waits in the outbox and is stored with it (README decision 026).
   */
  stamp: S;
  /** The panel's create mutation (it invalidates the visit's lists); the record is sent with it, under the visit. */
  mutation: {
    isPending: boolean;
    // NoInfer: the body's type comes from the form alone, as the schema's output.
    mutateAsync: (variables: NoInfer<Stamped<Body, S>> & { visitId: string }) => Promise<unknown>;
  };
}

/** A record made and sent the panel's own way (an evacuation's reading: its minutes, behind its evacuation). */
interface OwnSaveOptions<Typed extends FieldValues, Body, Item extends Sent> extends SaveOptions<Typed, Body, Item> {
  /** The panel's mutation (it invalidates the visit's lists); `send` calls it. */
  mutation: { isPending: boolean };
  /** The record as sent: the checked body with its client id. */
  record: (body: Body, clientId: string) => Item;
  /** Sends the record now; without a connection it is kept in the outbox instead (README decision 027). */
  send: (record: Item) => Promise<unknown>;
}

export interface ProcedureSave {
  /** For the form's onSubmit. */
  submit: () => Promise<void>;
  /** The message above the button. */
  formError: string | null;
  /** Takes the message above the button away (what it said no longer applies). */
  dismiss: () => void;
  /** Whether the last save was kept on the device rather than reaching the server. */
  stored: boolean;
  /** Whether a save is being sent. */
  pending: boolean;
}

/** The record and its sending for a stamped save: the moment is taken on each attempt, as the save happens. */
function stampedSave<Typed extends FieldValues, Body, S extends Stamp>({
  stamp,
  mutation,
  visitId,
}: StampedSaveOptions<Typed, Body, S>): Pick<OwnSaveOptions<Typed, Body, Stamped<Body, S>>, "record" | "send"> {
  return {
    // A computed key is typed as a string index; it is the one field named by `stamp`.
    record: (body, clientId) => ({
      ...body,
      clientId,
      ...({ [stamp]: new Date().toISOString() } as Record<S, string>),
    }),
    send: (record) => mutation.mutateAsync({ visitId, ...record }),
  };
}

/**
 * The save of a procedure record, written once for every panel: the shared schema checks what
 * was typed (the form's resolver), the record gets one client id kept across retries so a save
 * whose answer was lost is stored once (README decision 026), it is sent or kept on the device
 * when there is no connection, the form is cleared for the next one, and a refusal puts the
 * server's messages under the fields that caused them (`fieldMessages` keys are the form's
 * field paths) with its message above the button. A record is the body stamped with the moment
 * of the save (`stamp`) and sent with the panel's mutation, or made and sent the panel's own way
 * (`record` and `send`).
 */
export function useProcedureSave<Typed extends FieldValues, Body, S extends Stamp>(
  options: StampedSaveOptions<Typed, Body, S>,
): ProcedureSave;
export function useProcedureSave<Typed extends FieldValues, Body, Item extends Sent>(
  options: OwnSaveOptions<Typed, Body, Item>,
): ProcedureSave;
export function useProcedureSave<Typed extends FieldValues, Body>(
  options: StampedSaveOptions<Typed, Body, Stamp> | OwnSaveOptions<Typed, Body, Sent>,
): ProcedureSave {
  const {
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
    // The overloads type each panel's record; here a record is any record with its client id.
  } = ("stamp" in options ? { ...options, ...stampedSave(options) } : options) as OwnSaveOptions<Typed, Body, Sent>;
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

  const dismiss = () => setFormError(null);

  return { submit, dismiss, formError, stored, pending: mutation.isPending };
}
