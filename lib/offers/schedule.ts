import type { Database } from "@/db/client";
import { getDb } from "@/lib/database/app-database";
import { readEnv } from "@/lib/env/env";
import { releaseExpiredHolds } from "./hold-writes";
import { sendDueReminders } from "./reminders";

export const FITTING_SCHEDULE_INTERVAL_MS = 5 * 60_000;

const message = (error: unknown) => (error instanceof Error ? error.message : String(error));

/**
 * One step of the fittings' schedule: gives back the tires of holds whose day has ended, then sends
 * the day-before reminders. Each part runs even when the other fails; failures are logged, never thrown.
 */
export async function runFittingSchedule(db: Database, now: Date = new Date()): Promise<{ released: number; reminded: number }> {
  const released = await releaseExpiredHolds(db, now).catch((error: unknown) => {
    console.error(`Fitting schedule: holds not released: ${message(error)}`);
    return 0;
  });
  const reminded = await sendDueReminders(db, now);
  return { released, reminded };
}

const RUNNING = Symbol.for("sidewise.fittingSchedule");
type ScheduleGlobal = typeof globalThis & { [RUNNING]?: () => void };

/**
 * Runs the schedule every five minutes in this server process, the first run one interval after the
 * start (so a starting server opens no database for it), unless FITTING_SCHEDULE=off. The timer is
 * unref'd, so it never keeps a process alive; a step still running when the next is due is not
 * doubled. Several servers may run it at once: holds are locked and reminders claimed row by row.
 * Answers how to stop it, or null when it is off or already running in this process.
 */
export function startFittingSchedule({ intervalMs = FITTING_SCHEDULE_INTERVAL_MS, database = getDb } = {}): (() => void) | null {
  const scope = globalThis as ScheduleGlobal;
  if (readEnv().FITTING_SCHEDULE === "off" || scope[RUNNING]) return null;
  let busy = false;
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    database()
      .then((db) => runFittingSchedule(db, new Date()))
      .catch((error: unknown) => console.error(`Fitting schedule: step skipped: ${message(error)}`))
      .finally(() => {
        busy = false;
      });
  }, intervalMs);
  timer.unref();
  const stop = () => {
    clearInterval(timer);
    delete scope[RUNNING];
  };
  scope[RUNNING] = stop;
  return stop;
}
