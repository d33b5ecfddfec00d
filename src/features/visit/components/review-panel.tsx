import { LockOpen } from "lucide-react";
import { useState } from "react";
import type { Visit } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { useReviewVisit } from "@/lib/api/visits.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

interface ReviewPanelProps {
  visit: Visit;
  canSubmit: boolean;
  canSignOff: boolean;
}

/** A labelled two-line text box for a review note or reason. */
function ReasonBox({ id, label, value, onChange, placeholder }: { id: string; label: string; value: string; onChange: (value: string) => void; placeholder: string }) {
  return (
    <>
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      <textarea
        id={id}
        rows={2}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        placeholder={placeholder}
        className="block w-full rounded-card border-2 border-rule bg-surface p-3"
      />
    </>
  );
}

/**
 * Submit for review (crew); sign off or send back with a reason (senior, owner); and reopen a
 * visit awaiting review or signed off, with a reason, so that it can be corrected (senior, owner).
 */
export function ReviewPanel({ visit, canSubmit, canSignOff }: ReviewPanelProps) {
  const review = useReviewVisit();
  const [reason, setReason] = useState("");
  const [reopenReason, setReopenReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const act = async (action: "submit" | "sign-off" | "send-back" | "reopen") => {
    setError(null);
    if (action === "send-back" && reason.trim().length < 3) return setError("Say what needs doing before sign-off");
    if (action === "reopen" && reopenReason.trim().length < 3) return setError("Say why the visit is reopened, e.g. “pressure test entered wrongly”");
    try {
      await review.mutateAsync(
        action === "send-back"
          ? { visitId: visit.id, action, reason }
          : action === "reopen"
            ? { visitId: visit.id, action, reason: reopenReason }
            : action === "sign-off"
              ? { visitId: visit.id, action, note: reason || undefined }
              : { visitId: visit.id, action },
      );
      setReopenReason("");
      setReason("");
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "That did not go through");
    }
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
        {canSubmit && submittable && (
          <Button onClick={() => void act("submit")} disabled={review.isPending}>
            Submit for review
          </Button>
        )}
        {canSignOff && reviewable && (
          <div className="space-y-2">
            <ReasonBox id="review-reason" label="Note or reason" value={reason} onChange={setReason} placeholder="A note with the sign-off, or what needs doing if you send it back" />
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
              value={reopenReason}
              onChange={setReopenReason}
              placeholder="What must be corrected, e.g. “pressure test entered as 3500 kPa, was 350”"
            />
            <p className="text-sm text-muted">Reopening lets the crew void and re-enter records; the reason goes in the audit trail{visit.status === "signed-off" ? " and the visit will need signing off again" : ""}.</p>
            <Button variant="secondary" onClick={() => void act("reopen")} disabled={review.isPending}>
              <LockOpen aria-hidden className="size-5" /> Reopen the visit
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}
