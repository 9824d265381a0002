export { FittingsInputError, isTimeZone } from "./inputs";
export { addLocalDays, endOfLocalDay, todayIn } from "./local-time";
export { MAX_SLOT_DAYS, slotRequestSchema, weeklyHoursSchema, type SlotRequest } from "./slot-request";
export { findSlot, fittingSlots, sameInstant, type FittingSlot } from "./slots";
export { belowHeldMessage, canHold, coversHeld, notEnoughToHoldMessage, sellableQuantity } from "./holds";
export { fittingCalendar, type FittingEvent } from "./calendar";
