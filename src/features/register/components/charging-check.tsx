import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { ChargingUpdateSchema, type CircuitBalance } from "@shared/schemas/register.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { useSetCharging } from "@/lib/api/register.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { formatKg, formatSignedKg } from "../utils/format-register.ts";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { VerdictLine } from "./verdict-line.tsx";

type FormValues = { lineAdjustmentKg: unknown };

/**
 * The weighed-in charge of one circuit against its nameplate. The weighed-in mass is the
 * register's reused + added kg; the technician only says that it was a full weigh-in and
 * enters the line-length adjustment from the maker's table (TRADE.md §6).
 */
export function ChargingCheck({
  visitId,
  balance,
  canWrite,
}: {
  visitId: string;
  balance: CircuitBalance;
  canWrite: boolean;
}) {
  const setCharging = useSetCharging();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FormValues>({
    resolver: zodResolver(ChargingUpdateSchema) as never,
    defaultValues: { lineAdjustmentKg: balance.charging?.lineAdjustmentKg ?? 0 },
  });
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await setCharging.mutateAsync({
        visitId,
        circuit: balance.circuit,
        value: { lineAdjustmentKg: values.lineAdjustmentKg as number },
      });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["lineAdjustmentKg"]));
    }
  });
  const charging = balance.charging;
  return (
    <div className="space-y-3" data-testid={`charging-${balance.circuit}`}>
      {charging ? (
        <>
          <p>
            Weighed in <span className="num font-semibold">{formatKg(charging.weighedInKg)}</span> against{" "}
            <span className="num">{formatKg(charging.check.expectedKg)}</span> expected (nameplate{" "}
            {formatKg(balance.nameplateKg)}
            {charging.lineAdjustmentKg !== 0 && (
              <>, line adjustment {formatSignedKg(charging.lineAdjustmentKg)}</>
            )}): <span className="num font-semibold">{formatSignedKg(charging.check.differenceKg)}</span>
          </p>
          <VerdictLine result={charging.check} testId={`charging-verdict-${balance.circuit}`} />
          <p className="text-sm text-muted">
            Then confirm the charge by subcooling (TXV/EEV) or superheat (fixed orifice) once the readings settle.
          </p>
        </>
      ) : (
        <p className="text-muted">
          {balance.reusedKg + balance.addedKg > 0
            ? "Refrigerant was added without a recovery: a top-up is not checked against the nameplate. If the circuit was empty and the whole charge was weighed in, say so below."
            : "No charge weighed in on this circuit yet."}
        </p>
      )}
      {canWrite && (charging || balance.reusedKg + balance.addedKg > 0) && (
        <form onSubmit={submit} noValidate className="space-y-2" aria-label={`Weigh-in of circuit ${balance.circuit}`}>
          {formError && <FormAlert>{formError}</FormAlert>}
          <div className="max-w-xs">
            <NumberField
              unit="kg"
              label="Line-length adjustment"
              registration={form.register("lineAdjustmentKg", { setValueAs: typedNumber })}
              error={form.formState.errors.lineAdjustmentKg?.message}
              hint="From the maker's table for the extra (or missing) liquid line: + adds, − removes; 0 if none."
            />
          </div>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="secondary" disabled={setCharging.isPending}>
              {charging?.declared ? "Update the weigh-in" : "Record a full weigh-in"}
            </Button>
            {/* Withdrawing a declaration voids it with a reason; the earlier figure stays on record. */}
            {charging?.declarationId && (
              <VisitVoidAction
                visitId={visitId}
                kind="charging"
                recordId={charging.declarationId}
                what={`the full weigh-in declaration of circuit ${balance.circuit}`}
                disabled={setCharging.isPending}
              />
            )}
          </div>
        </form>
      )}
    </div>
  );
}
