import type { EmailSendRow } from "@/lib/email/queries";
import { formatDateTime, shopTimesCaption } from "@/lib/format/format";

export const statusLabel = { sent: "Sent", failed: "Failed", sending: "Sending" } as const;

/** Who e-mailed this card to whom, when, and how it went: for staff only. */
export function EmailHistory({ sends, timeZone }: { sends: EmailSendRow[]; timeZone: string }) {
  if (sends.length === 0) return <p className="text-ink-soft">Nobody has e-mailed this card yet.</p>;
  return (
    <div className="overflow-x-auto" role="region" aria-labelledby="email-history-heading" tabIndex={0}>
      <table className="w-full border-collapse text-left text-sm">
        <caption id="email-history-heading" className="mb-2 text-left font-semibold">
          Sent from this card ({shopTimesCaption(timeZone)})
        </caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className="py-2 pr-3">When</th>
            <th scope="col" className="py-2 pr-3">By</th>
            <th scope="col" className="py-2 pr-3">To</th>
            <th scope="col" className="py-2">Status</th>
          </tr>
        </thead>
        <tbody>
          {sends.map((send) => (
            <tr key={send.id} className="border-b border-rule align-top">
              <td className="py-2 pr-3">{formatDateTime(send.createdAt, { timeZone })}</td>
              <td className="py-2 pr-3">{send.senderName ?? "A removed account"}</td>
              <td className="py-2 pr-3 wrap-anywhere">{send.toAddress}</td>
              <td className="py-2">
                <span className={send.status === "failed" ? "font-semibold text-danger" : "font-semibold"}>{statusLabel[send.status]}</span>
                {send.attempts > 1 ? ` after ${send.attempts} tries` : ""}
                {send.status === "failed" && send.error ? <span className="block text-ink-soft">{send.error}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
