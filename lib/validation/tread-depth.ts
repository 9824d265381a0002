import { z } from "zod";
import { TREAD_DEPTH32_MAX, TREAD_DEPTH32_MIN } from "@/lib/tire";

const RULE = `give the tread depth as a whole number of 32nds of an inch from ${TREAD_DEPTH32_MIN} to ${TREAD_DEPTH32_MAX}, such as 10 for 10/32 in`;

/** A new tire's tread depth in 32nds of an inch (the range and why: lib/tire/vocabulary.ts). */
export const treadDepth32Schema = z
  .number({ error: RULE })
  .int(RULE)
  .min(TREAD_DEPTH32_MIN, RULE)
  .max(TREAD_DEPTH32_MAX, RULE)
  .describe(`New tread depth in 32nds of an inch, ${TREAD_DEPTH32_MIN}–${TREAD_DEPTH32_MAX}.`);
