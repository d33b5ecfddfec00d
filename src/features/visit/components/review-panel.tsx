import { zodResolver } from "@hookform/resolvers/zod";
import { AlertTriangle, ClipboardCheck, LockOpen, Send } from "lucide-react";
import { useId, useState } from "react";
import { useForm, type FieldErrors, type UseFormRegisterReturn } from "react-hook-form";
import { z } from "zod";
import { submitChecklist } from "@shared/engine/index.ts";
import {
  hasReason,
  MAX_REASON_LENGTH,
  REASON_NEEDED_MESSAGE,
  ReviewActionSchema,
  type Visit,
} from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useEquipmentDetail } from "@/lib/api/equipment.ts";
import {
  useElectricalChecks,
  useEvacuations,
  usePressureTests,
  useStandingPressureChecks,
} from "@/lib/api/procedures.ts";
import { useVisitRefrigerant } from "@/lib/api/register.ts";
import { useReviewVisit } from "@/lib/api/visits.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

interface ReviewPanelProps {
  visit: Visit;
  canSubmit: boolean;
  canSignOff: boolean;
}

/**
 * Submitting, as the server checks it; a visit started without a reason needs one here, in this
 * screen's words, before the shared schema's own check of it.
 */
const submitSchema = (needsReason: boolean) =>
  z
    .object({
      reason: z.string().refine((reason) => !needsReason || reason.trim().length >= 3, REASON_NEEDED_MESSAGE),
    })
    .transform(({ reason }) => ({ action: "submit" as const, ...(needsReason ? { reason } : {}) }))
    .pipe(ReviewActionSchema.options[0]);

/** Signing off (the text is a note) or sending back (it is the reason), as the server checks it. */
const ReviewFormSchema = z.preprocess(
  (typed: { action: "sign-off" | "send-back"; reason: string }) =>
    typed.action === "send-back"
      ? { action: typed.action, reason: typed.reason }
      : { action: typed.action, note: typed.reason || undefined },
  ReviewActionSchema,
);

/** Reopening, as the server checks it: the reason goes in the audit trail. */
const ReopenFormSchema = z.preprocess(
  (typed: { reason: string }) => ({ action: "reopen", reason: typed.reason }),
  ReviewActionSchema,
);

/** The first message of a refused form: the panel says one thing at a time, above its buttons. */
const firstMessage = (errors: FieldErrors): string =>
  Object.values(errors)
    .find((error) => error?.message)
    ?.message?.toString() ?? "That did not go through";

/** A labelled two-line text box for a review note or reason. */
function ReasonBox({
  id,
  label,
  registration,
  placeholder,
}: {
  id: string;
  label: string;
  registration: UseFormRegisterReturn;
  placeholder: string;
}) {
  return (
    <>
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      <textarea
        id={id}
        rows={2}
        placeholder={placeholder}
        {...registration}
        className="block w-full rounded-card border-2 border-rule bg-surface p-3"
      />
    </>
  );
}

/**
 * What to look at before the visit goes for review, fetched when the technician asks to
 * submit: circuits without readings, failed tests, charge not in the register (warnings they
 * acknowledge by confirming), and the reason for the visit, which must be given here if it
 * was left out at the start.
 */
function SubmitChecklist({ visit, onDone }: { visit: Visit; onDone: () => void }) {
  const review = useReviewVisit();
  const equipment = useEquipmentDetail(visit.equipmentId);
  const pressureTests = usePressureTests(visit.id);
  const evacuations = useEvacuations(visit.id);
  const standing = useStandingPressureChecks(visit.id);
  const electrical = useElectricalChecks(visit.id);
  const refrigerant = useVisitRefrigerant(visit.id);
  const needsReason = !hasReason(visit.reason);
  const form = useForm({ resolver: zodResolver(submitSchema(needsReason)), defaultValues: { reason: "" } });
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  const queries = [equipment, pressureTests, evacuations, standing, electrical, refrigerant];
  const failed = queries.find((query) => query.isError)?.error;

  if (!failed && queries.some((query) => query.isPending)) {
    return (
      <p aria-busy="true" className="text-muted">
        Checking the visit before it goes…
      </p>
    );
  }
  // A check that could not load is said plainly; the technician may still submit (the server checks the reason).
  const items =
    failed ||
    !equipment.data ||
    !pressureTests.data ||
    !evacuations.data ||
    !standing.data ||
    !electrical.data ||
    !refrigerant.data
      ? []
      : submitChecklist({
          reason: visit.reason,
          circuits: equipment.data.equipment.circuits.map((circuit) => circuit.number),
          // Which circuits have standing readings, counted by the server over all of them.
          readings: visit.circuitLogs
            .filter((log) => log.readingCount > 0)
            .map((log) => ({ circuit: log.circuit, voided: null })),
          adjustments: visit.adjustments,
          registerChargedKg: refrigerant.data.circuits.reduce(
            (sum, circuit) => sum + circuit.addedKg + circuit.reusedKg,
            0,
          ),
          tests: {
            pressureTests: pressureTests.data.pressureTests.map((test) => ({
              voided: test.voided,
              verdict: test.result.overall.verdict,
              reason: test.result.overall.reason,
            })),
            evacuations: evacuations.data.evacuations.map((evacuation) => ({
              voided: evacuation.voided,
              verdict: evacuation.result.overall?.verdict ?? null,
              reason: evacuation.result.overall?.reason ?? "",
            })),
            standingPressureChecks: standing.data.standingPressureChecks.map((check) => ({
              voided: check.voided,
              verdict: check.result.verdict,
              reason: check.result.reason,
            })),
            electricalChecks: electrical.data.electricalChecks.map((check) => ({
              voided: check.voided,
              verdict: check.result.overall.verdict,
              reason: check.result.overall.reason,
            })),
          },
        });
  const warnings = items.filter((item) => !item.blocking);

  const submit = () => {
    setError(null);
    return form.handleSubmit(
      async (body) => {
        try {
          await review.mutateAsync({ visitId: visit.id, ...body });
          onDone();
        } catch (caught) {
          setError(
            caught instanceof ApiError
              ? (caught.fields.reason ?? caught.message)
              : caught instanceof Error
                ? caught.message
                : "That did not go through",
          );
        }
      },
      (errors) => setError(firstMessage(errors)),
    )();
  };

  return (
    <div
      role="group"
      aria-labelledby={`${id}-title`}
      className="space-y-3 rounded-card border-2 border-ink p-3"
      data-testid="submit-checklist"
    >
      <h3 id={`${id}-title`} className="flex items-center gap-2 font-semibold">
        <ClipboardCheck aria-hidden className="size-5" /> Before it goes for review
      </h3>
      {failed && <FormAlert>Could not check everything ({failed.message}). You can still submit.</FormAlert>}
      {!failed && warnings.length === 0 && (
        <p>Nothing to flag: every circuit has readings, no test failed, the charge is in the register.</p>
      )}
      {warnings.length > 0 && (
        <ul className="space-y-2" aria-label="Warnings">
          {warnings.map((item) => (
            <li key={item.message} className="flex items-start gap-2">
              <AlertTriangle aria-hidden className="mt-0.5 size-5 shrink-0 text-caution" />
              <span>{item.message}</span>
            </li>
          ))}
        </ul>
      )}
      {needsReason && (
        <div className="space-y-1">
          <label htmlFor={`${id}-reason`} className="block font-medium">
            Reason for the visit (required)
          </label>
          <p id={`${id}-reason-hint`} className="text-sm text-muted">
            It was left for later when the visit started: the reviewer and the customer read it first.
          </p>
          <textarea
            id={`${id}-reason`}
            rows={2}
            maxLength={MAX_REASON_LENGTH}
            {...form.register("reason")}
            aria-required="true"
            aria-describedby={`${id}-reason-hint`}
            aria-invalid={error === REASON_NEEDED_MESSAGE || undefined}
            placeholder="e.g. “Not cooling; tenant reports warm air from the supply grilles”"
            className="block w-full rounded-card border-2 border-rule bg-surface p-3 aria-[invalid=true]:border-fault"
          />
        </div>
      )}
      {error && <FormAlert>{error}</FormAlert>}
      {warnings.length > 0 && (
        <p className="text-sm">Confirming says you have read these; the reviewer sees the same records.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void submit()} disabled={review.isPending}>
          <Send aria-hidden className="size-5" />{" "}
          {review.isPending ? "Submitting…" : warnings.length > 0 ? "Confirm and submit anyway" : "Confirm and submit"}
        </Button>
        <Button variant="secondary" onClick={onDone} disabled={review.isPending}>
          Not yet
        </Button>
      </div>
    </div>
  );
}

/**
 * Submit for review (crew); sign off or send back with a reason (senior, owner); and reopen a
 * visit awaiting review or signed off, with a reason, so that it can be corrected (senior, owner).
 */
export function ReviewPanel({ visit, canSubmit, canSignOff }: ReviewPanelProps) {
  const review = useReviewVisit();
  // Two forms: the reviewer's note or reason (sign off or send back), and the reason to reopen.
  const reviewForm = useForm({
    resolver: zodResolver(ReviewFormSchema),
    defaultValues: { action: "sign-off" as "sign-off" | "send-back", reason: "" },
  });
  const reopenForm = useForm({ resolver: zodResolver(ReopenFormSchema), defaultValues: { reason: "" } });
  const [error, setError] = useState<string | null>(null);
  const [checking, setChecking] = useState(false);
  const send = async (body: z.output<typeof ReviewActionSchema>) => {
    try {
      await review.mutateAsync({ visitId: visit.id, ...body });
      reopenForm.reset();
      reviewForm.reset();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "That did not go through");
    }
  };
  const refused = (errors: FieldErrors) => setError(firstMessage(errors));
  const act = (action: "sign-off" | "send-back" | "reopen") => {
    setError(null);
    if (action === "reopen") return reopenForm.handleSubmit(send, refused)();
    reviewForm.setValue("action", action);
    return reviewForm.handleSubmit(send, refused)();
  };
  const reviewable = visit.status === "open" || visit.status === "awaiting-review";
  const submittable = visit.status === "open" || visit.status === "sent-back";
  const reopenable = visit.status === "awaiting-review" || visit.status === "signed-off";

  return (
    <section aria-labelledby="review-heading" className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id="review-heading" className="flex flex-wrap items-center gap-2 text-lg font-semibold">
        Review <VisitStatusBadge status={visit.status} />
      </h2>
      {visit.status === "sent-back" && visit.reviewNote && (
        <p className="mt-2 font-medium text-fault">Sent back: {visit.reviewNote}</p>
      )}
      {visit.status === "signed-off" && (
        <p className="mt-2">
          Signed off by <strong>{visit.signedOffBy?.name ?? "a former member"}</strong>
          {visit.signedOffAt && ` on ${formatDateTime(visit.signedOffAt)}`}
          {visit.reviewNote && ` — “${visit.reviewNote}”`}
        </p>
      )}
      {error && (
        <div className="mt-2">
          <FormAlert>{error}</FormAlert>
        </div>
      )}
      <div className="mt-3 space-y-3">
        {canSubmit &&
          submittable &&
          (checking ? (
            <SubmitChecklist visit={visit} onDone={() => setChecking(false)} />
          ) : (
            <Button onClick={() => setChecking(true)} disabled={review.isPending}>
              Submit for review
            </Button>
          ))}
        {canSignOff && reviewable && (
          <div className="space-y-2">
            <ReasonBox
              id="review-reason"
              label="Note or reason"
              registration={reviewForm.register("reason")}
              placeholder="A note with the sign-off, or what needs doing if you send it back"
            />
            <div className="flex flex-wrap gap-2">
              <Button onClick={() => void act("sign-off")} disabled={review.isPending}>
                Sign off
              </Button>
              <Button variant="danger" onClick={() => void act("send-back")} disabled={review.isPending}>
                Send back
              </Button>
            </div>
          </div>
        )}
        {canSignOff && reopenable && (
          <div className="space-y-2 border-t-2 border-rule pt-3">
            <ReasonBox
              id="reopen-reason"
              label="Reason for reopening (required)"
              registration={reopenForm.register("reason")}
              placeholder="What must be corrected, e.g. “pressure test entered as 3500 kPa, was 350”"
            />
            <p className="text-sm text-muted">
              Reopening lets the crew void and re-enter records; the reason goes in the audit trail
              {visit.status === "signed-off" ? " and the visit will need signing off again" : ""}.
            </p>
            <Button variant="secondary" onClick={() => void act("reopen")} disabled={review.isPending}>
              <LockOpen aria-hidden className="size-5" /> Reopen the visit
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}
