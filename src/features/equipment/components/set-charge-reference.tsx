import { useQuery } from "@tanstack/react-query";
import { Crosshair } from "lucide-react";
import { useId, useRef, useState } from "react";
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

/**
 * "Set from a reading…": a senior picks a visit, then one settled reading of this circuit on it;
 * its subcooling, superheat, saturation temperatures and air become the reference point.
 */
export function SetChargeReference({ equipmentId, circuit, visits, units }: SetChargeReferenceProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [visitId, setVisitId] = useState("");
  const [readingId, setReadingId] = useState("");
  const [note, setNote] = useState("");
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
    setVisitId("");
    setReadingId("");
    setNote("");
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = async () => {
    // The same schema the server checks the body with.
    const parsed = ChargeReferenceSetSchema.safeParse({ readingId, ...(note.trim() ? { note } : {}) });
    if (!parsed.success)
      return setError(
        readingId === ""
          ? "Choose a reading of this circuit"
          : (parsed.error.issues[0]?.message ?? "Check the reading"),
      );
    setError(null);
    try {
      await set.mutateAsync({ circuit, body: parsed.data });
      dialog.current?.close();
    } catch (caught) {
      const field = caught instanceof ApiError ? caught.fields.readingId : undefined;
      setError(field ?? (caught instanceof Error ? caught.message : "The reference point was not set"));
    }
  };

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
          value={visitId}
          onChange={(event) => {
            setVisitId(event.target.value);
            setReadingId("");
          }}
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
            <SelectField label="Reading" value={readingId} onChange={(event) => setReadingId(event.target.value)}>
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
            value={note}
            onChange={(event) => setNote(event.target.value)}
            className="block w-full rounded-card border-2 border-rule bg-surface p-3"
          />
        </div>
      </ModalForm>
    </>
  );
}
