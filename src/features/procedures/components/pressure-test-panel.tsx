import { formatTime } from "@shared/format/date-time.ts";
import { Save } from "lucide-react";
import { useState } from "react";
import { testPressureNotice } from "@shared/engine/index.ts";
import {
  PRESSURE_TEST_SECTION_LABELS,
  PRESSURE_TEST_SECTIONS,
  PressureTestBodySchema,
  type PressureTestSection,
} from "@shared/schemas/procedure-records.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useCreatePressureTest, usePressureTests } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import {
  formatNumber,
  GAUGE_LABEL,
  gaugeFromDisplay,
  gaugeToDisplay,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  temperatureFromDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { useFieldErrors } from "../hooks/use-field-errors.ts";
import { toConverted, toNumber } from "../utils/parse-number.ts";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { ProcedureLayout } from "./procedure-layout.tsx";
import { PressureTestView } from "./pressure-test-view.tsx";
import { LiveNoticeLine } from "./live-notice.tsx";

interface PressureTestPanelProps {
  visitId: string;
  units: DisplayUnits;
  atmosphericKPa: number;
  canWrite: boolean;
  readOnlyNote?: string;
}

/** The nameplate rating that applies to the part tested: the lower side governs a whole-system test. */
function ratedFor(section: PressureTestSection, high: number | null, low: number | null): number | null {
  if (section === "high-side") return high;
  if (section === "low-side") return low;
  const known = [high, low].filter((value): value is number => value !== null);
  return known.length > 0 ? Math.min(...known) : null;
}

/**
 * The nitrogen strength/tightness test: test pressure against the rating the technician
 * confirms, start and end of the hold with their temperatures; the server corrects the drop
 * for temperature (ideal gas) and judges it against the allowed drop.
 */
export function PressureTestPanel({ visitId, units, atmosphericKPa, canWrite, readOnlyNote }: PressureTestPanelProps) {
  const tests = usePressureTests(visitId);
  const create = useCreatePressureTest();
  // One id per entry, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const defaults = tests.data?.defaults;
  const pressureUnit = GAUGE_LABEL[units.pressure];
  const temperatureUnit = TEMPERATURE_LABEL[units.temperature];
  const shown = (kPa: number) =>
    formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure]);

  const [section, setSection] = useState<PressureTestSection>("whole-system");
  const [rated, setRated] = useState<string | null>(null);
  const [start, setStart] = useState("");
  const [startTemp, setStartTemp] = useState("");
  const [end, setEnd] = useState("");
  const [endTemp, setEndTemp] = useState("");
  const [hold, setHold] = useState("");
  const [allowed, setAllowed] = useState<string | null>(null);
  const [note, setNote] = useState("");
  const [formError, setFormError] = useState<string | null>(null);

  // Until the technician types their own, the nameplate rating and the organisation's allowed drop are offered.
  const ratedDefault = defaults ? ratedFor(section, defaults.ratedHighSideKPa, defaults.ratedLowSideKPa) : null;
  const ratedText = rated ?? (ratedDefault !== null ? shown(ratedDefault) : "");
  const allowedText = allowed ?? (defaults ? shown(defaults.allowedDropKPa) : "");
  // A message goes as soon as its field is changed.
  const [errors, setErrors] = useFieldErrors({
    section,
    ratedKPa: ratedText,
    startGaugeKPa: start,
    startTempC: startTemp,
    endGaugeKPa: end,
    endTempC: endTemp,
    holdMinutes: hold,
    allowedDropKPa: allowedText,
    note,
  });
  const pressure = (text: string) =>
    toConverted(text, (value) => gaugeFromDisplay(value, units.pressure, atmosphericKPa));

  // While typing: the highest pressure in the hold against the lower of the typed and nameplate ratings.
  const held = [pressure(start), pressure(end)].filter(
    (value): value is number => value !== undefined && !Number.isNaN(value),
  );
  const ratedNotice = testPressureNotice(
    {
      testGaugeKPa: held.length > 0 ? Math.max(...held) : undefined,
      ratedKPa: pressure(ratedText),
      nameplateKPa: ratedDefault,
    },
    (kPa) => `${shown(kPa)} ${pressureUnit}`,
  );

  const save = async () => {
    setFormError(null);
    const temperature = (text: string) =>
      toConverted(text, (value) => temperatureFromDisplay(value, units.temperature));
    const body = {
      section,
      ratedKPa: pressure(ratedText),
      startGaugeKPa: pressure(start),
      startTempC: temperature(startTemp),
      endGaugeKPa: pressure(end),
      endTempC: temperature(endTemp),
      holdMinutes: toNumber(hold),
      allowedDropKPa: pressure(allowedText),
      atmosphericPressureKPa: atmosphericKPa,
      note: note.trim() || undefined,
    };
    const parsed = PressureTestBodySchema.safeParse(body);
    if (!parsed.success) {
      setErrors(fieldMessages(parsed.error));
      setFormError("Check the fields marked below");
      return;
    }
    setErrors({});
    try {
      // Taken now, by the device's clock; without a connection it waits in the outbox.
      const record = { ...parsed.data, clientId: entryId.take(), takenAt: new Date().toISOString() };
      await keepWhenOffline(() => create.mutateAsync({ visitId, ...record }), {
        kind: "pressure-test",
        visitId,
        path: procedureRecordsPath("pressure-tests", visitId),
        body: record,
      });
      entryId.release();
      setStart("");
      setEnd("");
      setStartTemp("");
      setEndTemp("");
      setHold("");
      setNote("");
    } catch (error) {
      if (error instanceof ApiError) setErrors(error.fields);
      setFormError(error instanceof Error ? error.message : "The test was not saved. Try again.");
    }
  };

  return (
    <ProcedureLayout
      caution="nitrogen"
      visitId={visitId}
      readOnlyNote={readOnlyNote}
      saved={{
        headingId: "pressure-saved-heading",
        title: "Tests on this visit",
        kind: "pressure-test",
        canVoid: canWrite,
        records: (tests.data?.pressureTests ?? []).map((test) => ({
          id: test.id,
          voided: test.voided,
          what: `the pressure test of ${formatTime(test.takenAt)}`,
          element: <PressureTestView test={test} units={units} atmosphericKPa={atmosphericKPa} />,
        })),
      }}
      loadError={tests.isError ? `The pressure tests could not be loaded: ${tests.error.message}` : undefined}
      form={
        canWrite
          ? {
              label: "New pressure test",
              title: "New nitrogen pressure test",
              onSubmit: () => void save(),
              children: (
                <>
                  <div className="grid gap-3 sm:grid-cols-2">
                    <SelectField
                      label="Part tested"
                      value={section}
                      onChange={(event) => {
                        setSection(event.target.value as PressureTestSection);
                        setRated(null);
                      }}
                    >
                      {PRESSURE_TEST_SECTIONS.map((value) => (
                        <option key={value} value={value}>
                          {PRESSURE_TEST_SECTION_LABELS[value]}
                        </option>
                      ))}
                    </SelectField>
                    <NumberField
                      label="Rated pressure (lowest-rated component)"
                      unit={pressureUnit}
                      value={ratedText}
                      onValueChange={setRated}
                      error={errors.ratedKPa}
                      hint={
                        ratedDefault !== null
                          ? "From the nameplate: confirm it for the parts under test"
                          : "Not on the nameplate record: enter it from the maker's data"
                      }
                    />
                  </div>
                  <fieldset className="grid grid-cols-2 gap-3">
                    <legend className="col-span-2 font-semibold">Start of the hold</legend>
                    <NumberField
                      label="Start pressure"
                      unit={pressureUnit}
                      value={start}
                      onValueChange={setStart}
                      error={errors.startGaugeKPa}
                    />
                    <NumberField
                      label="Start temperature"
                      unit={temperatureUnit}
                      value={startTemp}
                      onValueChange={setStartTemp}
                      error={errors.startTempC}
                      hint="Ambient or pipe"
                    />
                    <div className="col-span-2">
                      <LiveNoticeLine notice={ratedNotice} testId="test-pressure-notice" />
                    </div>
                  </fieldset>
                  <fieldset className="grid grid-cols-2 gap-3">
                    <legend className="col-span-2 font-semibold">End of the hold</legend>
                    <NumberField
                      label="End pressure"
                      unit={pressureUnit}
                      value={end}
                      onValueChange={setEnd}
                      error={errors.endGaugeKPa}
                    />
                    <NumberField
                      label="End temperature"
                      unit={temperatureUnit}
                      value={endTemp}
                      onValueChange={setEndTemp}
                      error={errors.endTempC}
                    />
                  </fieldset>
                  <div className="grid grid-cols-2 gap-3">
                    <NumberField
                      label="Hold time"
                      unit="min"
                      value={hold}
                      onValueChange={setHold}
                      error={errors.holdMinutes}
                    />
                    <NumberField
                      label="Allowed drop"
                      unit={units.pressure}
                      value={allowedText}
                      onValueChange={setAllowed}
                      error={errors.allowedDropKPa}
                      hint="After temperature correction; your company's figure"
                    />
                  </div>
                  <TextField
                    label="Note"
                    value={note}
                    onChange={(event) => setNote(event.target.value)}
                    error={errors.note}
                    placeholder="e.g. compressor and LP switch isolated"
                  />
                  {formError && <FormAlert>{formError}</FormAlert>}
                  <Button type="submit" size="lg" disabled={create.isPending}>
                    <Save aria-hidden className="size-5" /> {create.isPending ? "Saving…" : "Save pressure test"}
                  </Button>
                </>
              ),
            }
          : null
      }
    />
  );
}
