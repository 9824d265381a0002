/** What a driver brings to a booked fitting. Plain words, our own (common practice at a tire counter). */
export const fittingVisitChecklist = [
  "This offer, on your phone or printed: the shop finds your booking by it.",
  "The vehicle, with the key or adapter for locking wheel nuts if it has them.",
  "A few minutes to spare: arrive a little before the time so the fitting can start on time.",
] as const;
