import Link from "next/link";
import { formatCalendarDate, shopTimesCaption } from "@/lib/format/format";
import { fittingsHref, type FittingSpan, type FittingView } from "@/lib/offers/fitting-days";
import type { FittingListing } from "@/lib/offers/queries";
import { todayIn } from "@/lib/fittings";
import { FittingCard } from "./fitting-card";

const linkClass = "inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4";

interface FittingsBoardProps {
  view: FittingView;
  day: string;
  today: string;
  span: FittingSpan;
  fittings: FittingListing[];
  bays: number;
  timeZone: string;
}

/** The fittings of a day, a column per bay, or of a week, day by day; with links to the days around it. */
export function FittingsBoard({ view, day, today, span, fittings, bays, timeZone }: FittingsBoardProps) {
  const unit = view === "week" ? "week" : "day";
  return (
    <div className="flex flex-col gap-4">
      <nav aria-label="Fitting days" className="flex flex-wrap items-center gap-x-5 gap-y-1">
        <Link href={fittingsHref(span.previous, view)} prefetch={false} className={linkClass}>
          ← Previous {unit}
        </Link>
        <Link href={fittingsHref(span.next, view)} prefetch={false} className={linkClass}>
          Next {unit} →
        </Link>
        {span.days.includes(today) ? null : (
          <Link href={fittingsHref(today, view)} prefetch={false} className={linkClass}>
            Today
          </Link>
        )}
        <Link href={fittingsHref(day, view === "week" ? "day" : "week")} prefetch={false} className={linkClass}>
          {view === "week" ? "Show one day" : "Show the week"}
        </Link>
      </nav>
      <p role="status" className="text-ink-soft">
        {fittings.length === 0 ? `No fittings booked for this ${unit}.` : `${fittings.length} ${fittings.length === 1 ? "fitting" : "fittings"}`} · {shopTimesCaption(timeZone)}
      </p>
      {view === "week" ? <WeekList span={span} fittings={fittings} timeZone={timeZone} /> : fittings.length > 0 ? <BayColumns fittings={fittings} bays={bays} timeZone={timeZone} /> : null}
    </div>
  );
}

function BayColumns({ fittings, bays, timeZone }: { fittings: FittingListing[]; bays: number; timeZone: string }) {
  const used = Math.max(bays, ...fittings.map((fitting) => fitting.fitting!.bay));
  return (
    <div className="grid gap-4 md:grid-cols-[repeat(auto-fit,minmax(16rem,1fr))]">
      {Array.from({ length: used }, (_, index) => index + 1).map((bay) => {
        const inBay = fittings.filter((fitting) => fitting.fitting!.bay === bay);
        return (
          <section key={bay} aria-labelledby={`bay-${bay}`} className="flex flex-col gap-2">
            <h2 id={`bay-${bay}`} className="text-lg font-semibold">
              Bay {bay}
            </h2>
            {inBay.length === 0 ? <p className="text-ink-soft">Nothing booked.</p> : inBay.map((fitting) => <FittingCard key={fitting.id} fitting={fitting} timeZone={timeZone} />)}
          </section>
        );
      })}
    </div>
  );
}

function WeekList({ span, fittings, timeZone }: { span: FittingSpan; fittings: FittingListing[]; timeZone: string }) {
  return (
    <div className="flex flex-col gap-4">
      {span.days.map((date) => {
        const onDay = fittings.filter((fitting) => todayIn(timeZone, fitting.fitting!.start) === date);
        return (
          <section key={date} aria-labelledby={`day-${date}`} className="flex flex-col gap-2">
            <h2 id={`day-${date}`} className="text-lg font-semibold">
              <Link href={fittingsHref(date, "day")} prefetch={false} className="text-accent underline underline-offset-4">
                {formatCalendarDate(date, "full")}
              </Link>
            </h2>
            {onDay.length === 0 ? <p className="text-ink-soft">No fittings booked for this day.</p> : onDay.map((fitting) => <FittingCard key={fitting.id} fitting={fitting} timeZone={timeZone} showBay />)}
          </section>
        );
      })}
    </div>
  );
}
