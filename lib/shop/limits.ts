/** The most a per-tire charge may be: $1,000.00 a tire is a typing mistake, not a price. */
export const MAX_CHARGE_CENTS = 100_000;

/**
 * Above this the Counter asks the admin to check the tax rate (15 %): combined US state and local
 * sales taxes stay below it everywhere (common practice; rates change, so it is a warning only).
 */
export const HIGH_TAX_RATE_BP = 1_500;

/** Wear match's default limit, in 32nds of an inch, whole or half; the database's check (shop_wear_limit) holds the same. */
export const WEAR_LIMIT_32 = {
  min: 0.5,
  max: 8,
  rule: "wearLimit32 is the tread-depth difference allowed between any two tires, in 32nds of an inch from 0.5 to 8, whole or a half, e.g. 2",
} as const;

/** The ranges of the fitting settings; the database's check (shop_fittings) holds the same numbers. */
export const FITTING_LIMITS = {
  bays: { min: 1, max: 20 },
  minutes: { min: 15, max: 480 },
  leadMinutes: { min: 0, max: 20_160 },
  cancelCutoffHours: { min: 0, max: 168 },
} as const;
