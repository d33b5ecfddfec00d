import { zodResolver } from "@hookform/resolvers/zod";
import { Controller, useForm } from "react-hook-form";
import { z } from "zod";
import { testPressureNotice } from "@shared/engine/index.ts";
import {
  PRESSURE_TEST_SECTION_LABELS,
  PRESSURE_TEST_SECTIONS,
  PressureTestBodySchema,
  type PressureTestSection,
} from "@shared/schemas/procedure-records.ts";
import { SelectField, TextField } from "@/components/ui/field/field.tsx";
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
import { useFormValues } from "@/hooks/use-form-values.ts";
import { useProcedureSave } from "../hooks/use-procedure-save.ts";
import { toConverted, toNumber } from "../utils/parse-number.ts";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { ProcedureLayout, type ProcedurePanelProps } from "./procedure-layout.tsx";
import { PressureTestView } from "./pressure-test-view.tsx";
import { LiveNoticeLine } from "./live-notice.tsx";

interface PressureTestPanelProps extends ProcedurePanelProps {
  units: DisplayUnits;
  atmosphericKPa: number;
}

/** What the form holds, named as the body's fields; a rating or allowed drop still null was not typed over. */
interface TypedPressureTest {
  section: PressureTestSection;
  ratedKPa: string | null;
  startGaugeKPa: string;
  startTempC: string;
  endGaugeKPa: string;
  endTempC: string;
  holdMinutes: string;
  allowedDropKPa: string | null;
  note: string;
}

const READINGS_CLEARED = {
  startGaugeKPa: "",
  startTempC: "",
  endGaugeKPa: "",
  endTempC: "",
  holdMinutes: "",
  note: "",
} as const;

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
export function PressureTestPanel({ units, atmosphericKPa, ...panel }: PressureTestPanelProps) {
  const { visitId } = panel;
  const tests = usePressureTests(visitId);
  const create = useCreatePressureTest();
  const defaults = tests.data?.defaults;
  const pressureUnit = GAUGE_LABEL[units.pressure];
  const temperatureUnit = TEMPERATURE_LABEL[units.temperature];
  const shown = (kPa: number) =>
    formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure]);
  const pressure = (text: string) =>
    toConverted(text, (value) => gaugeFromDisplay(value, units.pressure, atmosphericKPa));
  const temperature = (text: string) => toConverted(text, (value) => temperatureFromDisplay(value, units.temperature));

  // Until the technician types their own, the nameplate rating and the organisation's allowed drop are offered.
  const ratedDefaultFor = (section: PressureTestSection) =>
    defaults ? ratedFor(section, defaults.ratedHighSideKPa, defaults.ratedLowSideKPa) : null;
  const ratedTextOf = (typed: TypedPressureTest) => {
    const offered = ratedDefaultFor(typed.section);
    return typed.ratedKPa ?? (offered !== null ? shown(offered) : "");
  };
  const allowedTextOf = (typed: TypedPressureTest) =>
    typed.allowedDropKPa ?? (defaults ? shown(defaults.allowedDropKPa) : "");
  /** The body POST …/pressure-tests takes: what was typed, in the units the server keeps. */
  const toBody = (typed: TypedPressureTest) => ({
    section: typed.section,
    ratedKPa: pressure(ratedTextOf(typed)),
    startGaugeKPa: pressure(typed.startGaugeKPa),
    startTempC: temperature(typed.startTempC),
    endGaugeKPa: pressure(typed.endGaugeKPa),
    endTempC: temperature(typed.endTempC),
    holdMinutes: toNumber(typed.holdMinutes),
    allowedDropKPa: pressure(allowedTextOf(typed)),
    atmosphericPressureKPa: atmosphericKPa,
    note: typed.note.trim() || undefined,
  });

  const form = useForm<TypedPressureTest, unknown, z.output<typeof PressureTestBodySchema>>({
    resolver: zodResolver(z.preprocess(toBody, PressureTestBodySchema)),
    defaultValues: { section: "whole-system", ratedKPa: null, allowedDropKPa: null, ...READINGS_CLEARED },
  });
  const { errors } = form.formState;
  const save = useProcedureSave({
    form,
    visitId,
    mutation: create,
    stamp: "takenAt",
    entry: () => ({ kind: "pressure-test", path: procedureRecordsPath("pressure-tests", visitId) }),
    // The part tested, its rating and the allowed drop stay for a retest.
    cleared: (typed) => ({ ...typed, ...READINGS_CLEARED }),
    notSaved: "The test was not saved. Try again.",
  });

  const typed = useFormValues(form.control);
  const ratedDefault = ratedDefaultFor(typed.section);
  const ratedText = ratedTextOf(typed);
  const allowedText = allowedTextOf(typed);
  // While typing: the highest pressure in the hold against the lower of the typed and nameplate ratings.
  const held = [pressure(typed.startGaugeKPa), pressure(typed.endGaugeKPa)].filter(
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

  return (
    <ProcedureLayout
      {...panel}
      caution="nitrogen"
      kind="pressure-test"
      saved={{
        title: "Tests on this visit",
        records: tests.data?.pressureTests,
        name: "the pressure test",
        view: (test) => <PressureTestView test={test} units={units} atmosphericKPa={atmosphericKPa} />,
      }}
      loadError={tests.isError ? `The pressure tests could not be loaded: ${tests.error.message}` : undefined}
      form={{
        label: "New pressure test",
        title: "New nitrogen pressure test",
        save,
        saveLabel: "Save pressure test",
        children: (
          <>
            <div className="grid gap-3 sm:grid-cols-2">
              <SelectField
                label="Part tested"
                // Another part has another rating: the nameplate's is offered again.
                {...form.register("section", { onChange: () => form.setValue("ratedKPa", null) })}
              >
                {PRESSURE_TEST_SECTIONS.map((value) => (
                  <option key={value} value={value}>
                    {PRESSURE_TEST_SECTION_LABELS[value]}
                  </option>
                ))}
              </SelectField>
              <Controller
                control={form.control}
                name="ratedKPa"
                render={({ field }) => (
                  <NumberField
                    ref={field.ref}
                    label="Rated pressure (lowest-rated component)"
                    unit={pressureUnit}
                    value={ratedText}
                    onValueChange={field.onChange}
                    onBlur={field.onBlur}
                    error={errors.ratedKPa?.message}
                    hint={
                      ratedDefault !== null
                        ? "From the nameplate: confirm it for the parts under test"
                        : "Not on the nameplate record: enter it from the maker's data"
                    }
                  />
                )}
              />
            </div>
            <fieldset className="grid grid-cols-2 gap-3">
              <legend className="col-span-2 font-semibold">Start of the hold</legend>
              <NumberField
                label="Start pressure"
                unit={pressureUnit}
                registration={form.register("startGaugeKPa")}
                error={errors.startGaugeKPa?.message}
              />
              <NumberField
                label="Start temperature"
                unit={temperatureUnit}
                registration={form.register("startTempC")}
                error={errors.startTempC?.message}
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
                registration={form.register("endGaugeKPa")}
                error={errors.endGaugeKPa?.message}
              />
              <NumberField
                label="End temperature"
                unit={temperatureUnit}
                registration={form.register("endTempC")}
                error={errors.endTempC?.message}
              />
            </fieldset>
            <div className="grid grid-cols-2 gap-3">
              <NumberField
                label="Hold time"
                unit="min"
                registration={form.register("holdMinutes")}
                error={errors.holdMinutes?.message}
              />
              <Controller
                control={form.control}
                name="allowedDropKPa"
                render={({ field }) => (
                  <NumberField
                    ref={field.ref}
                    label="Allowed drop"
                    unit={units.pressure}
                    value={allowedText}
                    onValueChange={field.onChange}
                    onBlur={field.onBlur}
                    error={errors.allowedDropKPa?.message}
                    hint="After temperature correction; your company's figure"
                  />
                )}
              />
            </div>
            <TextField
              label="Note"
              error={errors.note?.message}
              placeholder="e.g. compressor and LP switch isolated"
              {...form.register("note")}
            />
          </>
        ),
      }}
    />
  );
}
