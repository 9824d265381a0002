import { PhoneLink } from "@/components/ui/phone-link";
import { fittingVisitChecklist } from "@/content/fitting-visit";
import { formatCalendarDate, formatDateTime, formatTime } from "@/lib/format/format";
import type { PublicOffer } from "@/lib/offers/public-offer";
import { CancelFitting } from "./cancel-fitting";
import { shopDateOf } from "./slot-days";

interface OfferAppointmentProps {
  offer: PublicOffer & { appointment: NonNullable<PublicOffer["appointment"]> };
  token: string;
  /** Whether the driver may still cancel online (now is before `cancelUntil`). */
  canCancel: boolean;
}

/** The booked fitting: when and where, what to bring, and cancelling it while that is still allowed. */
export function OfferAppointment({ offer, token, canCancel }: OfferAppointmentProps) {
  const { appointment, timeZone, shop } = offer;
  const when = formatDateTime(appointment.start, { timeZone });
  return (
    <section aria-labelledby="fitting-heading" className="flex flex-col gap-3 rounded border-2 border-accent bg-sheet p-4 print:break-inside-avoid">
      <h2 id="fitting-heading" className="text-xl font-semibold">
        Your fitting
      </h2>
      <p className="text-lg">
        <span className="font-semibold">
          {formatCalendarDate(shopDateOf(appointment.start), "full")}, {formatTime(appointment.start, { timeZone })}
        </span>{" "}
        to {formatTime(appointment.end, { timeZone })} ({timeZone} time)
      </p>
      <p>
        At {shop.name}, {shop.address}. Phone{" "}
        <PhoneLink phone={shop.phone} className="font-semibold underline" />
        .
      </p>
      <div>
        <h3 className="font-semibold">What to bring</h3>
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {fittingVisitChecklist.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      </div>
      {canCancel && offer.cancelUntil ? (
        <>
          <p className="text-sm">Can&apos;t come? You can cancel here until {formatDateTime(offer.cancelUntil, { timeZone })}.</p>
          <CancelFitting token={token} when={when} />
        </>
      ) : (
        <p className="text-sm font-semibold">It is too late to cancel online: if you cannot come, call the shop at {shop.phone}.</p>
      )}
    </section>
  );
}
