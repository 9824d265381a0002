/** Called once when a Next.js server starts: starts the fittings' schedule in the Node.js runtime only. */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // Imported here, so that no other runtime bundles the database code.
    const { startFittingSchedule } = await import("@/lib/offers/schedule");
    startFittingSchedule();
  }
}
