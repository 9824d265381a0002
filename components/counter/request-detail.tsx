import { LabelledRows } from "@/components/ui/labelled-rows";
import Link from "next/link";
import type { ReactNode } from "react";
import { PhoneLink } from "@/components/ui/phone-link";
import type { EmailStatus } from "@/db/schema";
import { sourceHref, sourceLabels } from "@/lib/quotes/labels";
import type { QuoteRequestDetail } from "@/lib/quotes/queries";
import { formatDateTime } from "@/lib/format/format";

const emailWords: Record<EmailStatus, string> = { sent: "e-mailed", sending: "e-mail being sent", failed: "e-mail failed" };

/** Everything the driver sent, as a list of labelled values. */
export function RequestFields({ request, timeZone }: { request: QuoteRequestDetail; timeZone: string }) {
  const from = sourceHref(request.source, request.reference);
  const rows: [string, ReactNode][] = [
    ["Received", <time key="t" dateTime={request.createdAt.toISOString()}>{formatDateTime(request.createdAt, { timeZone })}</time>],
    ["E-mail", <a key="e" href={`mailto:${request.email}`} className="break-all text-accent underline underline-offset-4">{request.email}</a>],
    ["Phone", request.phone ? <PhoneLink key="p" phone={request.phone} className="text-accent underline underline-offset-4" /> : "not given"],
    ["Vehicle", request.vehicle],
    [
      "Tires",
      <ul key="tires" className="list-none">
        {request.tires
          .split("\n")
          .filter((line) => line.trim() !== "")
          .map((line, index) => (
            <li key={index}>{line}</li>
          ))}
      </ul>,
    ],
    ["How many", String(request.quantity)],
    ["Preferred day", request.preferredDay ?? "no preference"],
    ["Sent from", from ? <Link key="s" href={from} prefetch={false} className="text-accent underline underline-offset-4">{sourceLabels[request.source]} {request.reference}</Link> : `${sourceLabels[request.source]}${request.reference ? ` ${request.reference}` : ""}`],
  ];
  return (
    <LabelledRows rows={rows} className="gap-y-2 rounded border border-rule bg-sheet p-4 sm:grid-cols-[10rem_minmax(0,1fr)]" />
  );
}

/** The shop's replies so far, oldest first, with who wrote each and how its e-mail went. */
export function RequestReplies({ replies, timeZone }: { replies: QuoteRequestDetail["replies"]; timeZone: string }) {
  if (replies.length === 0) return <p className="text-ink-soft">No reply yet.</p>;
  return (
    <ol className="flex flex-col gap-3">
      {replies.map((reply) => (
        <li key={reply.id} className="rounded border border-rule bg-sheet p-4">
          <p className="text-sm text-ink-soft">
            {reply.authorName} · <time dateTime={reply.createdAt.toISOString()}>{formatDateTime(reply.createdAt, { timeZone })}</time> ·{" "}
            <span className={reply.emailStatus === "failed" ? "font-semibold text-danger" : undefined}>{reply.emailStatus ? emailWords[reply.emailStatus] : "not e-mailed"}</span>
          </p>
          <p className="mt-2 break-words whitespace-pre-line">{reply.body}</p>
          {reply.emailStatus === "failed" && reply.emailError ? <p className="mt-2 text-sm text-danger">The e-mail service said: {reply.emailError}</p> : null}
        </li>
      ))}
    </ol>
  );
}
