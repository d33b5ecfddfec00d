import { zodResolver } from "@hookform/resolvers/zod";
import { GraduationCap } from "lucide-react";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { useNavigate } from "react-router-dom";
import { CaseFromReadingSchema } from "@shared/schemas/casebook.ts";
import type { Reading } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useCreateCaseFromReading } from "@/lib/api/casebook.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

const label = (reading: Reading) => `Circuit ${reading.circuit}, ${formatDateTime(reading.takenAt)}`;

/**
 * Turns a real reading into a draft casebook case for apprentices: the server copies the
 * numbers and the kind of unit only, never the customer, and opens it in the case editor.
 */
export function CaseFromReading({ readings }: { readings: Reading[] }) {
  const form = useForm({
    resolver: zodResolver(CaseFromReadingSchema),
    defaultValues: { readingId: readings.at(-1)?.id ?? "" },
  });
  const readingId = useWatch({ control: form.control, name: "readingId" });
  const [error, setError] = useState<string | null>(null);
  const create = useCreateCaseFromReading();
  const navigate = useNavigate();
  const submit = form.handleSubmit(
    async (values) => {
      try {
        const created = await create.mutateAsync(values.readingId);
        void navigate(paths.casebook.edit.getHref(created.id));
      } catch (caught) {
        setError(caught instanceof Error ? caught.message : "The case was not made");
      }
    },
    (errors) => setError(errors.readingId?.message ?? null),
  );
  if (readings.length === 0) return null;
  return (
    <section aria-labelledby="case-from-reading-heading" className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id="case-from-reading-heading" className="flex items-center gap-2 text-lg font-semibold">
        <GraduationCap aria-hidden className="size-5" /> Teach from this visit
      </h2>
      <p className="text-sm text-muted">
        Make a draft casebook case from one reading. Customer and site details are left out.
      </p>
      {error && (
        <div className="mt-2">
          <FormAlert>{error}</FormAlert>
        </div>
      )}
      <div className="mt-2 flex flex-wrap items-end gap-2">
        <div>
          <label htmlFor="case-reading" className="block text-sm font-medium">
            Reading
          </label>
          <select
            id="case-reading"
            {...form.register("readingId")}
            className="min-h-touch rounded-card border-2 border-rule bg-surface px-3"
          >
            {readings.map((reading) => (
              <option key={reading.id} value={reading.id}>
                {label(reading)}
              </option>
            ))}
          </select>
        </div>
        <Button
          variant="secondary"
          disabled={create.isPending || readingId === ""}
          onClick={() => {
            setError(null);
            void submit();
          }}
        >
          {create.isPending ? "Making the case…" : "Make a casebook case"}
        </Button>
      </div>
    </section>
  );
}
