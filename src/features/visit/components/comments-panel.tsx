import { zodResolver } from "@hookform/resolvers/zod";
import { MessageSquare } from "lucide-react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { Visit } from "@shared/schemas/visits.ts";
import { CommentCreateSchema, MAX_COMMENT_LENGTH } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { commentsPath, useCreateComment } from "@/lib/api/visits.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline, useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";
import { formatDateTime, formatTime } from "@shared/format/date-time.ts";

/** The comment as the server checks it, after a first check for an empty box in this form's own words. */
const CommentFormSchema = z.object({
  body: z
    .string()
    .refine((body) => body.trim() !== "", "Write a comment first")
    .pipe(CommentCreateSchema.shape.body),
  readingId: z.string(),
});

/** The visit's conversation: comments on the visit or on one reading, for the crew and the reviewer. */
export function CommentsPanel({ visit, canComment }: { visit: Visit; canComment: boolean }) {
  const form = useForm({ resolver: zodResolver(CommentFormSchema), defaultValues: { body: "", readingId: "" } });
  const [error, setError] = useState<string | null>(null);
  const createComment = useCreateComment();
  // One id per comment, kept across retries: a post whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const onDevice = useOutboxEntries().filter((entry) => entry.visitId === visit.id && entry.kind === "comment");

  const submit = form.handleSubmit(async ({ body, readingId }) => {
    const values = { body, readingId: readingId || null, clientId: entryId.take() };
    try {
      await keepWhenOffline(() => createComment.mutateAsync({ visitId: visit.id, ...values }), {
        kind: "comment",
        visitId: visit.id,
        label: `Comment: “${body.length > 40 ? `${body.slice(0, 40)}…` : body}”`,
        path: commentsPath(visit.id),
        body: values,
      });
      entryId.release();
      form.reset();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The comment was not saved");
    }
  });
  const shownError = form.formState.errors.body?.message ?? error;

  return (
    <section aria-labelledby="comments-heading" className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id="comments-heading" className="flex items-center gap-2 text-lg font-semibold">
        <MessageSquare aria-hidden className="size-5" /> Comments
      </h2>
      {visit.comments.length === 0 ? (
        <p className="mt-2 text-muted">No comments yet.</p>
      ) : (
        <ul className="mt-2 space-y-3">
          {visit.comments.map((comment) => (
            <li key={comment.id} className="border-l-4 border-accent pl-3">
              <p className="text-sm text-muted">
                <strong className="text-ink">{comment.author?.name ?? "Former member"}</strong> ·{" "}
                {formatDateTime(comment.createdAt)}
                {comment.reading && (
                  <>
                    {" "}
                    · on the reading of circuit {comment.reading.circuit}, {formatTime(comment.reading.takenAt)}
                  </>
                )}
              </p>
              <p className="whitespace-pre-wrap">{comment.body}</p>
            </li>
          ))}
        </ul>
      )}
      <div className="mt-2">
        <WaitingEntries entries={onDevice} />
      </div>
      {canComment && (
        <form
          className="mt-3 space-y-2"
          onSubmit={(event) => {
            setError(null);
            void submit(event);
          }}
        >
          {shownError && <FormAlert>{shownError}</FormAlert>}
          <label htmlFor="comment-body" className="block font-medium">
            Add a comment
          </label>
          <textarea
            id="comment-body"
            maxLength={MAX_COMMENT_LENGTH}
            // Another text is another comment: it gets its own client id.
            {...form.register("body", { onChange: () => entryId.release() })}
            rows={3}
            className="block w-full rounded-card border-2 border-rule bg-surface p-3"
          />
          {visit.readings.length > 0 && (
            <div>
              <label htmlFor="comment-reading" className="block text-sm font-medium">
                About
              </label>
              <select
                id="comment-reading"
                {...form.register("readingId")}
                className="min-h-touch rounded-card border-2 border-rule bg-surface px-3"
              >
                <option value="">The whole visit</option>
                {visit.readings.map((reading) => (
                  <option key={reading.id} value={reading.id}>
                    Reading: circuit {reading.circuit}, {formatTime(reading.takenAt)}
                  </option>
                ))}
              </select>
            </div>
          )}
          <Button type="submit" variant="secondary" disabled={createComment.isPending}>
            {createComment.isPending ? "Posting…" : "Post comment"}
          </Button>
        </form>
      )}
    </section>
  );
}
