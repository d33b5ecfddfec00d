import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery } from "@tanstack/react-query";
import { Crosshair } from "lucide-react";
import { useId, useRef, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { z } from "zod";
import { ChargeReferenceSetSchema, MAX_CLEAR_REASON_LENGTH } from "@shared/schemas/charge-references.ts";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { ModalForm } from "@/components/ui/modal-form/modal-form.tsx";
import { FormAlert, SelectField } from "@/components/ui/field/field.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useSetChargeReference } from "@/lib/api/charge-references.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";
import {
  DIFFERENCE_LABEL,
  TEMPERATURE_DECIMALS,
  differenceToDisplay,
  formatNumber,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

interface SetChargeReferenceProps {
  equipmentId: string;
  circuit: number;
  /** The unit's visits, newest first: the reading is chosen from one of them. */
  visits: VisitSummary[];
  units: DisplayUnits;
}

/** What the dialog holds: the visit only narrows the readings offered; the body is the reading and the note. */
interface TypedChoice {
  visitId: string;
  readingId: string;
  note: string;
}

/** The body as the server checks it: the form of ChargeReferenceSetSchema that names a reading. */
const SetFromReadingSchema = z.preprocess(
  (typed: TypedChoice) => ({ readingId: typed.readingId, ...(typed.note.trim() ? { note: typed.note } : {}) }),
  ChargeReferenceSetSchema.options[0],
);

/**
 * "Set from a reading…": a senior picks a visit, then one settled reading of this circuit on it;
 * its subcooling, superheat, saturation temperatures and air become the reference point.
 */
export function SetChargeReference({ equipmentId, circuit, visits, units }: SetChargeReferenceProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const form = useForm({
    resolver: zodResolver(SetFromReadingSchema),
    defaultValues: { visitId: "", readingId: "", note: "" },
  });
  const visitId = useWatch({ control: form.control, name: "visitId" });
  const [error, setError] = useState<string | null>(null);
  const set = useSetChargeReference(equipmentId);
  // Only once a visit is chosen: no query fires with an empty id.
  const visit = useQuery({ ...visitQueryOptions(visitId), enabled: visitId !== "" });
  const id = useId();
  const withReadings = visits.filter((candidate) => candidate.readingCount > 0);
  // The latest readings the detail carries and the circuit's readings that matter (the server's choice over all of them).
  const keyReadings = visit.data?.circuitLogs.find((log) => log.circuit === circuit)?.keyReadings ?? [];
  const held = (visit.data?.readings ?? []).filter((reading) => reading.circuit === circuit && reading.voided === null);
  const readings = [
    ...held,
    ...keyReadings.filter((reading) => !held.some((candidate) => candidate.id === reading.id)),
  ].sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt));
  const difference = (kelvin: number | null) =>
    kelvin === null
      ? "—"
      : `${formatNumber(differenceToDisplay(kelvin, units.temperature), TEMPERATURE_DECIMALS)} ${DIFFERENCE_LABEL[units.temperature]}`;

  const open = () => {
    form.reset();
    setError(null);
    dialog.current?.showModal();
  };
  // The dialog shows one message at a time, above its fields.
  const confirm = () =>
    form.handleSubmit(
      async (body) => {
        setError(null);
        try {
          await set.mutateAsync({ circuit, body });
          dialog.current?.close();
        } catch (caught) {
          const field = caught instanceof ApiError ? caught.fields.readingId : undefined;
          setError(field ?? (caught instanceof Error ? caught.message : "The reference point was not set"));
        }
      },
      (errors) => setError(errors.readingId?.message ?? errors.note?.message ?? "Check the reading"),
    )();
  return (
    <>
      <Button variant="secondary" onClick={open}>
        <Crosshair aria-hidden className="size-5" /> Set from a reading…
      </Button>
      <ModalForm
        dialogRef={dialog}
        title={<>Set circuit {circuit}&rsquo;s reference point</>}
        explanation="Choose a settled reading taken at the correct charge (after a weigh-in of the nameplate charge). Later charge estimates on this circuit are measured from it; the current reference point stays in the history."
        error={error}
        pending={set.isPending}
        submit={
          <>
            <Crosshair aria-hidden className="size-5" /> {set.isPending ? "Setting…" : "Set the reference point"}
          </>
        }
        onSubmit={() => void confirm()}
      >
        <SelectField
          label="Visit"
          // Another visit, other readings: the one chosen before is not among them.
          {...form.register("visitId", { onChange: () => form.setValue("readingId", "") })}
        >
          <option value="">Choose a visit…</option>
          {withReadings.map((candidate) => (
            <option key={candidate.id} value={candidate.id}>
              {formatDateTime(candidate.startedAt)} — {candidate.reason}
            </option>
          ))}
        </SelectField>
        {visitId !== "" && visit.isPending && <p aria-busy="true">Loading the visit&rsquo;s readings…</p>}
        {visit.isError && <FormAlert>The visit did not load: {visit.error.message}</FormAlert>}
        {visit.isSuccess &&
          (readings.length === 0 ? (
            <p className="text-muted">No standing reading of circuit {circuit} on this visit.</p>
          ) : (
            <SelectField label="Reading" {...form.register("readingId")}>
              <option value="">Choose a reading…</option>
              {readings.map((reading) => (
                <option key={reading.id} value={reading.id}>
                  {formatDateTime(reading.takenAt)} · superheat {difference(reading.result.superheatK)} · subcooling{" "}
                  {difference(reading.result.subcoolingK)}
                </option>
              ))}
            </SelectField>
          ))}
        <div className="space-y-1">
          <label htmlFor={`${id}-note`} className="block font-medium">
            Note (optional)
          </label>
          <textarea
            id={`${id}-note`}
            rows={2}
            maxLength={MAX_CLEAR_REASON_LENGTH}
            {...form.register("note")}
            className="block w-full rounded-card border-2 border-rule bg-surface p-3"
          />
        </div>
      </ModalForm>
    </>
  );
}
