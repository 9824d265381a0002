import { statusLabel } from "@/components/fit-card/email-history";
import type { EmailKind } from "@/db/schema";
import type { EmailSendRow } from "@/lib/email/queries";
import { formatDateTime, shopTimesCaption } from "@/lib/format/format";

const kindLabel: Record<EmailKind, string> = {
  fit_card: "Fit card",
  quote_to_shop: "Request to the shop",
  quote_confirmation: "Request confirmation",
  quote_reply: "Reply to a request",
  offer: "Priced offer",
  fitting_booked: "Fitting booked",
  fitting_booked_shop: "Fitting booked, to the shop",
  fitting_cancelled: "Fitting cancelled",
  fitting_cancelled_shop: "Fitting cancelled, to the shop",
  fitting_reminder: "Fitting reminder",
};

/** The last e-mails the product sent or tried to send, with how many tries and what went wrong. */
export function OutboxSendTable({ sends, timeZone }: { sends: EmailSendRow[]; timeZone: string }) {
  if (sends.length === 0) return <p className="text-ink-soft">Nothing has been sent yet.</p>;
  return (
    <div className="overflow-x-auto" role="region" aria-labelledby="outbox-sends-caption" tabIndex={0}>
      <table className="w-full border-collapse text-left text-sm">
        <caption id="outbox-sends-caption" className="mb-2 text-left font-semibold">
          {sends.length === 1 ? "The only e-mail so far" : `The last ${sends.length} e-mails, newest first`} ({shopTimesCaption(timeZone)})
        </caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className="py-2 pr-3">When</th>
            <th scope="col" className="py-2 pr-3">E-mail</th>
            <th scope="col" className="py-2">Status</th>
          </tr>
        </thead>
        <tbody>
          {sends.map((send) => (
            <tr key={send.id} className="border-b border-rule align-top">
              <td className="py-2 pr-3">{formatDateTime(send.createdAt, { timeZone })}</td>
              <td className="py-2 pr-3">
                <span className="font-semibold">{kindLabel[send.kind]}</span> to <span className="wrap-anywhere">{send.toAddress}</span>
                <span className="block text-ink-soft break-words">{send.subject}</span>
              </td>
              <td className="py-2">
                <span className={`font-semibold ${send.status === "failed" ? "text-danger" : ""}`}>{statusLabel[send.status]}</span>
                <span className="block text-ink-soft">
                  {send.attempts} {send.attempts === 1 ? "try" : "tries"}
                </span>
                {send.error ? <span className="block break-words">{send.error}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
