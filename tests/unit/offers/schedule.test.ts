import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { FITTING_SCHEDULE_INTERVAL_MS, startFittingSchedule } from "@/lib/offers/schedule";

describe("the fittings' schedule", () => {
  let stop: (() => void) | null = null;
  beforeEach(() => {
    vi.useFakeTimers();
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  afterEach(() => {
    stop?.();
    stop = null;
    vi.useRealTimers();
    vi.unstubAllEnvs();
    vi.restoreAllMocks();
  });

  it("opens no database at start, runs first one interval later and then every interval, logging a failed step", async () => {
    const database = vi.fn(() => Promise.reject(new Error("the database is down")));
    stop = startFittingSchedule({ database });
    expect(stop).toBeTypeOf("function");
    expect(database).not.toHaveBeenCalled();

    await vi.advanceTimersByTimeAsync(FITTING_SCHEDULE_INTERVAL_MS - 1);
    expect(database).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(1);
    expect(database).toHaveBeenCalledOnce();
    expect(console.error).toHaveBeenCalledWith("Fitting schedule: step skipped: the database is down");

    await vi.advanceTimersByTimeAsync(FITTING_SCHEDULE_INTERVAL_MS);
    expect(database).toHaveBeenCalledTimes(2);
  });

  it("runs once per process: a second start answers null while the first runs, and stop ends it", async () => {
    const database = vi.fn(() => Promise.reject(new Error("down")));
    stop = startFittingSchedule({ database });
    expect(startFittingSchedule({ database })).toBeNull();
    stop?.();
    stop = null;
    await vi.advanceTimersByTimeAsync(2 * FITTING_SCHEDULE_INTERVAL_MS);
    expect(database).not.toHaveBeenCalled();
  });

  it("does not start when FITTING_SCHEDULE=off", async () => {
    vi.stubEnv("FITTING_SCHEDULE", "off");
    const database = vi.fn(() => Promise.reject(new Error("down")));
    expect(startFittingSchedule({ database })).toBeNull();
    await vi.advanceTimersByTimeAsync(2 * FITTING_SCHEDULE_INTERVAL_MS);
    expect(database).not.toHaveBeenCalled();
  });
});
