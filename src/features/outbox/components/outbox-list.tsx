import type { OutboxMessage } from "@shared/schemas/outbox.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/** Turns the URLs of a plain-text mail into links, so a tester can follow an invitation in one tap. */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <>
      {parts.map((part, index) =>
        /^https?:\/\//.test(part) ? (
          <a key={index} href={part} className="break-all font-medium text-accent underline underline-offset-4">
            {part}
          </a>
        ) : (
          <span key={index}>{part}</span>
        ),
      )}
    </>
  );
}

export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  if (messages.length === 0)
    return <p className="text-muted">Nothing sent yet. Invitations and password resets show up here.</p>;
  // Other people's sign-in links are never shown whole (docs/accounts.md, "Outbox").
  return (
    <ul className="space-y-3">
      {messages.map((message) => (
        <li key={message.id}>
          <article
            aria-label={`Mail to ${message.to}: ${message.subject}`}
            className="rounded-card border-2 border-rule bg-surface p-4"
          >
            <header className="mb-2">
              <h2 className="font-semibold">{message.subject}</h2>
              <p className="text-sm text-muted">
                To <span className="break-all">{message.to}</span> ·{" "}
                <span className="num">{formatDateTime(message.createdAt)}</span>
              </p>
            </header>
            {message.linksHidden ? (
              <>
                <p className="whitespace-pre-wrap break-words">{message.text}</p>
                <p className="mt-2 text-sm text-muted">
                  The link in this message works only for {message.to}, so its token is hidden here.
                </p>
              </>
            ) : (
              <p className="whitespace-pre-wrap break-words">
                <Linkified text={message.text} />
              </p>
            )}
          </article>
        </li>
      ))}
    </ul>
  );
}
