/**
 * A visit's review: the status moves a review action makes (submit, sign off, send back, reopen),
 * who may make each, and the audit line each leaves. One place for the rules; the route parses
 * the body and calls reviewVisit.
 */
import { can, type Permission, type Role } from "@shared/schemas/auth.ts";
import {
  hasReason,
  REASON_NEEDED_MESSAGE,
  VISIT_EVENT_LABELS,
  VISIT_STATUS_LABELS,
  type ReviewAction,
  type VisitEventAction,
  type VisitStatus,
} from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import { insertVisitEvent } from "../db/visit-events.ts";
import { insertComment, updateVisitStatus } from "../db/visits.ts";
import { HttpError } from "../http/http-error.ts";
import { writeToVisit } from "./write-to-visit.ts";

/** Each review action: the statuses it starts from, where it leads, who may take it, and its audit line. */
export const TRANSITIONS: Record<
  ReviewAction["action"],
  {
    from: VisitStatus[];
    to: VisitStatus;
    permission: Permission;
    event: VisitEventAction;
    verb: string;
    refused: string;
  }
> = {
  submit: {
    from: ["open", "sent-back"],
    to: "awaiting-review",
    permission: "writeRecords",
    event: "submitted",
    verb: "submitted",
    refused: "Apprentices can read visits but not submit them",
  },
  "sign-off": {
    from: ["open", "awaiting-review"],
    to: "signed-off",
    permission: "signOff",
    event: "signed-off",
    verb: "signed off",
    refused: "Only a senior technician or an owner can sign off or send back",
  },
  "send-back": {
    from: ["open", "awaiting-review"],
    to: "sent-back",
    permission: "signOff",
    event: "sent-back",
    verb: "sent back",
    refused: "Only a senior technician or an owner can sign off or send back",
  },
  // Corrections after review: only a senior or owner reopens, with a reason kept in the audit trail.
  reopen: {
    from: ["awaiting-review", "signed-off"],
    to: "open",
    permission: "signOff",
    event: "reopened",
    verb: "reopened",
    refused: "Only a senior technician or an owner can reopen a visit",
  },
};

/**
 * Takes a review action on a visit, under its lock: refused (403) for a role the action is not
 * for, (409) from a status it does not start from, (400) a submit with no reason for the visit.
 */
export async function reviewVisit(
  db: Database,
  organisationId: string,
  visitId: string,
  action: ReviewAction,
  user: { id: string; role: Role },
): Promise<void> {
  const transition = TRANSITIONS[action.action];
  if (!can(user.role, transition.permission)) throw new HttpError(403, transition.refused);
  const refuse = (status: VisitStatus) =>
    new HttpError(409, `A visit that is ${VISIT_STATUS_LABELS[status].toLowerCase()} cannot be ${transition.verb}`);
  await writeToVisit(
    db,
    organisationId,
    visitId,
    async (tx, locked) => {
      if (action.action === "submit") {
        // A visit may start without its reason, but never goes for review without one.
        // Checked on the locked row, so a reason given meanwhile in another tab counts.
        const given = action.reason ?? "";
        if (!hasReason(given) && !hasReason(locked.reason))
          throw new HttpError(400, REASON_NEEDED_MESSAGE, { reason: REASON_NEEDED_MESSAGE });
        await updateVisitStatus(tx, visitId, { status: transition.to, ...(hasReason(given) ? { reason: given } : {}) });
        await insertVisitEvent(tx, organisationId, {
          visitId: visitId,
          action: transition.event,
          summary: VISIT_EVENT_LABELS[transition.event],
          reason: hasReason(given) ? `Reason for the visit: ${given}` : null,
          actorId: user.id,
        });
        return;
      }
      const reason = action.action === "sign-off" ? action.note || null : action.reason;
      if (action.action === "sign-off") {
        await updateVisitStatus(tx, visitId, {
          status: transition.to,
          reviewNote: reason,
          signedOffBy: user.id,
          signedOffAt: new Date(),
        });
      } else if (action.action === "send-back" || action.action === "reopen") {
        // Reopening undoes the sign-off on the visit itself; the trail keeps when it was signed and by whom.
        await updateVisitStatus(tx, visitId, {
          status: transition.to,
          reviewNote: action.action === "send-back" ? reason : null,
          signedOffBy: null,
          signedOffAt: null,
        });
      }
      // The reason also goes on the visit's thread, so the technician sees it in context.
      if (action.action === "send-back")
        await insertComment(tx, organisationId, {
          visitId: visitId,
          readingId: null,
          authorId: user.id,
          body: `Sent back: ${reason}`,
        });
      await insertVisitEvent(tx, organisationId, {
        visitId: visitId,
        action: transition.event,
        summary: VISIT_EVENT_LABELS[transition.event],
        reason,
        actorId: user.id,
      });
    },
    { allow: transition.from, refuse },
  );
}
