import { useState } from "react";
import type { Visit } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { useReviewVisit } from "@/lib/api/visits.ts";

interface ReviewPanelProps {
  visit: Visit;
  canSubmit: boolean;
  canSignOff: boolean;
}

/** Submit for review (crew) and sign off or send back with a reason (senior, owner). */
export function ReviewPanel({ visit, canSubmit, canSignOff }: ReviewPanelProps) {
  const review = useReviewVisit();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const act = async (action: "submit" | "sign-off" | "send-back") => {
    setError(null);
    if (action === "send-back" && reason.trim().length < 3) return setError("Say what needs doing before sign-off");
    try {
      await review.mutateAsync(
        action === "send-back" ? { visitId: visit.id, action, reason } : action === "sign-off" ? { visitId: visit.id, action, note: reason || undefined } : { visitId: visit.id, action },
      );
      setReason("");
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "That did not go through");
    }
  };
  const reviewable = visit.status === "open" || visit.status === "awaiting-review";
  const submittable = visit.status === "open" || visit.status === "sent-back";

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
          {visit.signedOffAt && ` on ${new Date(visit.signedOffAt).toLocaleString()}`}
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
            <label htmlFor="review-reason" className="block font-medium">
              Note or reason
            </label>
            <textarea
              id="review-reason"
              rows={2}
              value={reason}
              onChange={(event) => setReason(event.target.value)}
              placeholder="A note with the sign-off, or what needs doing if you send it back"
              className="block w-full rounded-card border-2 border-rule bg-surface p-3"
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
      </div>
    </section>
  );
}
