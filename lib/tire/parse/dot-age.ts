import type { DotCode } from "../types";
import type { DotReading } from "./reader";

const MS_PER_DAY = 86_400_000;
const MS_PER_YEAR = 365.2425 * MS_PER_DAY;
/** Inspect tires older than about 6 years; many makers advise replacing them at 10 (common practice). */
const INSPECT_AFTER_YEARS = 6;
const REPLACE_AFTER_YEARS = 10;

/** Monday of ISO week `week` of `year`, in UTC milliseconds. */
function weekStart(year: number, week: number): number {
  const jan4 = Date.UTC(year, 0, 4);
  const mondayOfWeek1 = jan4 - ((new Date(jan4).getUTCDay() + 6) % 7) * MS_PER_DAY;
  return mondayOfWeek1 + (week - 1) * 7 * MS_PER_DAY;
}

/** The date code with its age on `today`, adding the usual age cautions to `warnings`. */
export function withAge(dot: DotReading, today: Date | undefined, warnings: string[]): DotCode {
  const now = today?.getTime() ?? Number.NaN;
  const { plantCode, week, year, yearAmbiguous, tin } = dot;
  if (Number.isNaN(now)) return { plantCode, week, year, yearAmbiguous, tin, ageYears: null };
  const ageYears = (now - weekStart(year, week)) / MS_PER_YEAR;
  const made = `week ${dot.week} of ${dot.year}`;
  const whole = Math.floor(ageYears);
  if (ageYears < 0) {
    warnings.push(`The date code says ${made}, which has not come yet; check the marking.`);
  } else if (ageYears >= REPLACE_AFTER_YEARS) {
    warnings.push(`Made in ${made}, about ${whole} years ago. Many tire makers advise replacing tires ${REPLACE_AFTER_YEARS} years after manufacture, whatever the tread (common practice).`);
  } else if (ageYears >= INSPECT_AFTER_YEARS) {
    warnings.push(`Made in ${made}, about ${whole} years ago. Have tires older than about ${INSPECT_AFTER_YEARS} years inspected by a tire professional (common practice).`);
  }
  return { plantCode, week, year, yearAmbiguous, tin, ageYears };
}
