import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { ApiError } from "@/lib/api-client";
import { formatDateTime } from "@/lib/format";
import { useDevMail, type MailMessage } from "../api/get-dev-mail";
import { LinkedText } from "./linked-text";

function MessageView({ message }: { message: MailMessage }) {
  const [view, setView] = useState<"text" | "html">("text");
  return (
    <article
      aria-labelledby="message-subject"
      className="flex min-w-0 flex-col gap-3 rounded-lg bg-paper p-5 shadow-sm"
      data-testid="mail-message"
    >
      <header>
        <h2 id="message-subject" className="text-lg font-semibold">
          {message.subject}
        </h2>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
          <dt className="text-ink-soft">To</dt>
          <dd className="break-all">{message.to}</dd>
          <dt className="text-ink-soft">From</dt>
          <dd className="break-all">{message.from}</dd>
          <dt className="text-ink-soft">Received</dt>
          <dd className="num">{formatDateTime(message.receivedAt)}</dd>
        </dl>
      </header>
      <div role="group" aria-label="Show the message as" className="flex gap-1">
        {(["text", "html"] as const).map((v) => (
          <button
            key={v}
            type="button"
            aria-pressed={view === v}
            onClick={() => setView(v)}
            className={`rounded px-3 py-1 text-sm font-medium ${view === v ? "bg-spruce text-stone" : "bg-stone hover:bg-panel"}`}
          >
            {v === "text" ? "Plain text" : "Formatted (HTML)"}
          </button>
        ))}
      </div>
      {view === "text" ? (
        <pre
          className="whitespace-pre-wrap break-words rounded-md bg-stone p-4 font-sans text-sm"
          data-testid="mail-text"
        >
          <LinkedText text={message.text} />
        </pre>
      ) : (
        // The HTML comes from outside the app: shown only inside a sandbox with no rights at all.
        <iframe
          title="The message as HTML"
          sandbox=""
          srcDoc={message.html}
          className="h-96 w-full rounded-md border border-ink/15 bg-white"
        />
      )}
    </article>
  );
}

/** The development mailbox: every e-mail Waymark sent while running in demo or development mode. */
export function Mailbox() {
  const mail = useDevMail();
  const [openId, setOpenId] = useState<number | null>(null);
  if (mail.isPending) return <p className="text-ink-soft">Loading the mailbox…</p>;
  if (mail.error) {
    const off = mail.error instanceof ApiError && mail.error.status === 404;
    return off ? (
      <ErrorPanel
        title="The mailbox is off"
        message="The development mailbox exists only when Waymark runs in demo or development mode. Real e-mail goes to real inboxes."
      />
    ) : (
      <ErrorPanel title="The mailbox could not be loaded" message={mail.error.message} />
    );
  }
  const messages = mail.data;
  const open = messages.find((m) => m.id === openId) ?? null;
  if (messages.length === 0)
    return (
      <p className="rounded-lg bg-paper p-5 text-ink-soft shadow-sm">
        No e-mail has been sent yet. Invitations and review notices appear here within seconds.
      </p>
    );
  return (
    <div className="grid gap-4 lg:grid-cols-[22rem_1fr]">
      <ul className="flex flex-col gap-1 self-start rounded-lg bg-panel p-2" aria-label="Messages">
        {messages.map((m) => (
          <li key={m.id}>
            <button
              type="button"
              onClick={() => setOpenId(m.id)}
              aria-current={m.id === openId ? "true" : undefined}
              className={`w-full rounded-md p-2 text-left text-sm ${m.id === openId ? "bg-paper shadow-sm" : "hover:bg-stone"}`}
            >
              <span className="block font-semibold">{m.subject}</span>
              <span className="block truncate text-ink-soft">To {m.to}</span>
              <span className="num block text-xs text-ink-soft">{formatDateTime(m.receivedAt)}</span>
            </button>
          </li>
        ))}
      </ul>
      {open ? (
        <MessageView message={open} />
      ) : (
        <p className="rounded-lg bg-paper p-5 text-ink-soft shadow-sm">Choose a message to read it.</p>
      )}
    </div>
  );
}
