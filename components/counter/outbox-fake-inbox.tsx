import type { DevOutbox } from "@/lib/email/dev-outbox";
import { formatDateTime } from "@/lib/format/format";

/** What the local fake e-mail service received, newest first, with each e-mail's text and links. */
export function OutboxFakeInbox({ outbox, timeZone }: { outbox: DevOutbox; timeZone: string }) {
  if (outbox.status === "not_local") {
    return (
      <p className="rounded border-l-4 border-caution bg-caution-soft p-4">
        This inbox exists only in development, when e-mail goes to the local fake service (RESEND_BASE_URL on this machine). Here e-mail goes to the real
        provider: look there for what was delivered. The table below still shows every attempt.
      </p>
    );
  }
  if (outbox.status === "unreachable") {
    return (
      <p role="alert" className="rounded border-l-4 border-danger bg-sheet p-4">
        The local fake at <span className="font-mono">{outbox.url}</span> did not answer ({outbox.message}). Start it with <span className="font-mono">npm run dev</span>, or
        alone with <span className="font-mono">node scripts/fake-resend.mjs</span>.
      </p>
    );
  }
  if (outbox.emails.length === 0) return <p className="text-ink-soft">The local fake at {outbox.url} has received nothing since it started.</p>;
  return (
    <>
      <p className="text-ink-soft">Links that would sign their reader in or set a password, such as password resets, are hidden: only the recipient may use them.</p>
      <ol className="flex flex-col gap-3">
        {outbox.emails.map((email) => (
          <li key={email.id} className="rounded border border-rule bg-sheet p-4">
            <p className="font-semibold break-words">{email.subject}</p>
            <p className="text-sm text-ink-soft">
              To <span className="break-all">{email.to}</span> · <time dateTime={email.receivedAt.toISOString()}>{formatDateTime(email.receivedAt, { timeZone, seconds: true })}</time>
            </p>
            {email.attachments.length > 0 ? (
              <p className="text-sm">
                Attached: <span className="font-mono break-all">{email.attachments.join(", ")}</span>
              </p>
            ) : null}
            {email.links.length > 0 ? (
              <ul className="mt-2 flex flex-col">
                {email.links.map((link) => (
                  <li key={link}>
                    <a href={link} className="inline-flex min-h-11 items-center font-mono text-sm break-all text-accent underline underline-offset-4">
                      {link}
                    </a>
                  </li>
                ))}
              </ul>
            ) : null}
            <details className="mt-2">
              <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-accent">Show the text</summary>
              <pre className="mt-2 overflow-x-auto text-sm whitespace-pre-wrap">{email.text || "(no text version)"}</pre>
            </details>
          </li>
        ))}
      </ol>
    </>
  );
}
