/**
 * Says how many register lines the reader may not see (a colleague's, for a technician; all, for
 * an apprentice), so a balance that counts them does not look wrong. The server decides which
 * lines are shown (server/register/register-visibility.ts); this only reports the count.
 */
export function HiddenLinesNote({ count }: { count: number }) {
  if (count === 0) return null;
  return (
    <p className="text-sm text-muted" data-testid="hidden-register-lines">
      {count === 1 ? "1 entry" : `${count} entries`} logged by someone else {count === 1 ? "is" : "are"} not listed: the
      register shows each technician only their own lines. The figures above count {count === 1 ? "it" : "them"}.
    </p>
  );
}
