import { WEEKDAYS, type Weekday, type WeeklyHours } from "@/lib/tire";

const DAY_NAMES: Record<Weekday, string> = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" };

const dayText = (intervals: [string, string][]) => intervals.map(([from, to]) => `${from}–${to}`).join(", ");

/** "Mon–Fri 07:30–18:00, Sat 08:00–14:00": days with the same hours run together, closed days left out. */
export function describeOpeningHours(hours: WeeklyHours): string {
  const runs: { from: Weekday; to: Weekday; text: string }[] = [];
  for (const day of WEEKDAYS) {
    const text = dayText(hours[day]);
    const last = runs.at(-1);
    if (text === "") continue;
    if (last && last.text === text && WEEKDAYS.indexOf(last.to) === WEEKDAYS.indexOf(day) - 1) last.to = day;
    else runs.push({ from: day, to: day, text });
  }
  if (runs.length === 0) return "Closed";
  return runs.map((run) => `${DAY_NAMES[run.from]}${run.to === run.from ? "" : `–${DAY_NAMES[run.to]}`} ${run.text}`).join("; ");
}
