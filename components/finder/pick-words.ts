/** What ticking a result does, for who is looking: staff put it on a Fit card, a driver in a price request. */
export const pickLabel = (staff: boolean): string => (staff ? "Add to a Fit card" : "Add to my price request");

/** The phone's ask bar, counting the picked tires. */
export const askBarLabel = (picked: number): string => `Ask for a price (${picked} picked)`;
