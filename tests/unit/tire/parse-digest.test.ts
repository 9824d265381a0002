/**
 * Pins everything the decoder reads from two fixed sets of text, so that work on its speed cannot
 * change a single result: the bench's mixed markings, and text built from pieces of markings that
 * reaches the rarer readers (maximum load and pressure, ply ratings, inch sizes, errors). The digests
 * are SHA-256 of the JSON of every result, recorded from the decoder before it was made faster.
 * When a change to what the decoder reads is intended, check the new results and record the new digests.
 */
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { seededRandom } from "@/lib/demo/random";
import { parseMarking } from "@/lib/tire";
import { generateMarkings } from "../../bench/decode-markings";

const TODAY = new Date("2026-06-01T00:00:00Z");

const FRAGMENTS = [
  "285", "/", "50", "R", "20", " ", "LT", "P", "ST", "T", "C", "ZR", "RF", "x", "12.50", "16.5", "-", "(", ")", "Y", "116",
  "123/120", "S", "XL", "DOT", "3208", "328", "U2LL", "TREADWEAR", "500", "AA", "A", "M+S", "3PMSF", "LOAD", "RANGE", "E",
  "PLY", "MAX", "KG", "LBS", "PSI", "KPA", ",", ".", "0", "9", "99", "11", "22.5", "7.50", "D", "PRESS", "AT", "COLD", "1,360",
  "SINGLE", "DUAL", "LR", "RUN", "FLAT", "MUD", "AND", "SNOW", "THREE", "PEAK", "MOUNTAIN", "SNOWFLAKE", "TRACTION",
  "TEMPERATURE", "UTQG", "TIN", "×", "–", "日本", "\u00a0", "r", "xl", "dot", "205", "55", "91", "V",
  "285/50R20", "LT265/75R16E", "33x12.50R15LT", "11R22.5", "7.50-16", "ST205/75R15", "155R13", "185R14C", "245/40ZRF18",
  "285/50R 116T", "MAX LOAD 1360 KG (2998 LBS)", "MAX. PRESS. 350 KPA (51 PSI)", "51 PSI MAX PRESSURE",
  "MAX LOAD DUAL 1250 KG AT 550 KPA (80 PSI) COLD", "DOT U2LL LMLR 3208", "10 PLY RATING", "LOAD RANGE: E",
];

function fragmentText(count: number, seed: number): string[] {
  const random = seededRandom(seed);
  const piece = () => (random.next() < 0.5 ? " " : "") + random.pick(FRAGMENTS);
  return Array.from({ length: count }, () => Array.from({ length: random.int(1, 14) }, piece).join(""));
}

function digest(texts: readonly string[]): string {
  const hash = createHash("sha256");
  for (const text of texts) hash.update(`${JSON.stringify(parseMarking(text))}\n${JSON.stringify(parseMarking(text, { today: TODAY }))}\n`);
  return hash.digest("hex");
}

describe("the decoder reads the same as before", () => {
  it("from 20,000 of the bench's mixed markings", () => {
    expect(digest(generateMarkings(20_000))).toBe("6bfa1cafebe0fb627e5b61957bb987f46560d789ed62ce4e8f3f0bedf7bd783d");
  });

  it("from 20,000 texts built from pieces of markings", () => {
    expect(digest(fragmentText(20_000, 7))).toBe("95b2fab6df4bfe661f8ffe1a89a1b140e6bd68270cc143fe92a26ad6d05ac5f6");
  });
});
