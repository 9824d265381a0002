"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR from "swr";
import { addCalendarDays, formatCalendarDate, formatDateTime, shopTimesCaption } from "@/lib/format/format";
import { acceptOfferAt, fetchFreeSlots, type OfferAnswer } from "./post-offer";
import { slotDays, type FreeSlot } from "./slot-days";
import { SlotPicker } from "./slot-picker";
import { SuggestedSlots } from "./suggested-slots";

interface OfferBookingProps {
  token: string;
  timeZone: string;
  /** Today in the shop's zone: the first day of free times. */
  firstDay: string;
  /** How many days one list of free times covers. */
  windowDays: number;
  phone: string;
}

const buttonClass = "min-h-11 rounded border border-rule px-3 text-sm font-semibold disabled:opacity-60";

/** An open offer's free fitting times, a day at a time, and accepting it with the one chosen. */
export function OfferBooking({ token, timeZone, firstDay, windowDays, phone }: OfferBookingProps) {
  const router = useRouter();
  const [from, setFrom] = useState(firstDay);
  const [pickedDay, setPickedDay] = useState<string | null>(null);
  const [chosen, setChosen] = useState<FreeSlot | null>(null);
  const [busy, setBusy] = useState(false);
  const [answer, setAnswer] = useState<OfferAnswer | null>(null);
  const [missingChoice, setMissingChoice] = useState(false);
  const slots = useSWR(`/api/v1/offers/${encodeURIComponent(token)}/slots?from=${from}`, fetchFreeSlots, { revalidateOnFocus: false, keepPreviousData: true });
  const days = slotDays(slots.data?.slots ?? []);
  const day = days.find((candidate) => candidate.date === pickedDay) ?? days[0];
  const lastDay = addCalendarDays(from, windowDays - 1);

  function page(days: number) {
    setFrom(addCalendarDays(from, days));
    setPickedDay(null);
  }

  async function accept() {
    if (!chosen) {
      setMissingChoice(true);
      return;
    }
    setBusy(true);
    const result = await acceptOfferAt(token, chosen.start);
    setAnswer(result);
    setBusy(false);
    if (result.ok || result.code === "already_accepted") router.refresh();
    else if (result.nextSlots.length > 0) void slots.mutate();
  }

  if (answer?.ok) {
    const booked = answer.appointment ?? chosen;
    return (
      <p role="status" className="rounded border-l-4 border-accent bg-accent-soft p-3 font-semibold">
        Booked{booked ? `: ${formatDateTime(booked.start, { timeZone })}` : ""}. The shop holds these tires for you.
      </p>
    );
  }
  if (answer && answer.gone) {
    return (
      <p role="alert" className="rounded border-l-4 border-danger p-3 font-semibold text-danger">
        {answer.message}
      </p>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <p role="status" className="text-sm font-semibold empty:hidden">
        {slots.isLoading ? "Looking up free times…" : ""}
      </p>
      <p className="text-sm text-ink-soft">
        Free times from {formatCalendarDate(from, "short")} to {formatCalendarDate(lastDay, "short")}, {shopTimesCaption(timeZone)}.
      </p>
      {slots.error && !slots.data ? (
        <div role="alert" className="flex flex-wrap items-center gap-3 text-danger">
          <p>{slots.error.message}</p>
          <button type="button" onClick={() => void slots.mutate()} className={buttonClass}>
            Try again
          </button>
        </div>
      ) : !slots.data ? null : day ? (
        <SlotPicker
          days={days}
          day={day}
          chosen={chosen?.start ?? null}
          timeZone={timeZone}
          onDay={setPickedDay}
          onChoose={(slot) => {
            setChosen(slot);
            setMissingChoice(false);
          }}
        />
      ) : (
        <p role="status" className="font-semibold">
          No free times in these {windowDays} days: try later dates, or call the shop at {phone} to find a time together.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        {from > firstDay ? (
          <button type="button" onClick={() => page(-windowDays)} className={buttonClass}>
            Earlier dates
          </button>
        ) : null}
        <button type="button" onClick={() => page(windowDays)} className={buttonClass}>
          Later dates
        </button>
      </div>
      {answer && !answer.ok && answer.nextSlots.length > 0 ? (
        <SuggestedSlots slots={answer.nextSlots} chosen={chosen?.start ?? null} timeZone={timeZone} onChoose={setChosen} />
      ) : null}
      <div className="flex flex-col gap-2 border-t border-rule pt-4">
        <p className="text-sm" aria-live="polite">
          {chosen ? (
            <>
              Your choice: <span className="font-semibold">{formatDateTime(chosen.start, { timeZone })}</span>
            </>
          ) : (
            "Choose a day and a time above."
          )}
        </p>
        <button type="button" onClick={accept} disabled={busy} className="min-h-11 self-start rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
          {busy ? "Booking…" : "Accept and book this time"}
        </button>
        <p role="alert" className="text-sm font-semibold text-danger">
          {missingChoice ? "Choose a free time first, then accept." : answer && !answer.ok ? answer.message : ""}
        </p>
      </div>
    </div>
  );
}
