/**
 * Decoding speed by CPU time: 100,000 mixed markings from a fixed seed (20,000 with `quick`), decoded
 * by parseMarking, beside a floor measured in the same process on the same text: one exec of a plain
 * metric size pattern per marking. The two sides alternate, which goes first changes every round, and
 * each figure is the median of the rounds, so a busy moment on the machine weighs on both alike.
 * Goals: at least 500,000 markings a second, and at most 10 × the pattern's time per marking.
 *
 *   npm run bench:decode
 */
import { parseMarking } from "../../lib/tire/index";
import { generateMarkings } from "./decode-markings";
import { formatRange, formatTable, isMainModule, median, ratioRow, type Bench, type BenchRow } from "./report";

const GOAL_PER_SECOND = 500_000;
const MAX_RATIO = 10;
const WARM_UP_ROUNDS = 3;
/** The pattern is fast: its side reads the markings this many times a round, so a round lasts long enough to measure. */
const PATTERN_REPEATS = 10;
const METRIC_SIZE = /(\d{3})\/(\d{2})\s*(Z?R)\s*(\d{2})/i;

const cpuMs = (): number => {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
};

/** Kept so that no result can be optimised away. */
let sink = 0;

/** CPU nanoseconds per marking for one pass of parseMarking. */
function decodePass(markings: readonly string[]): number {
  const start = cpuMs();
  for (const marking of markings) if (parseMarking(marking).ok) sink++;
  return ((cpuMs() - start) * 1e6) / markings.length;
}

/** CPU nanoseconds per marking for one exec of the metric size pattern on each marking. */
function patternPass(markings: readonly string[]): number {
  const start = cpuMs();
  for (let repeat = 0; repeat < PATTERN_REPEATS; repeat++) {
    for (const marking of markings) if (METRIC_SIZE.exec(marking) !== null) sink++;
  }
  return ((cpuMs() - start) * 1e6) / (markings.length * PATTERN_REPEATS);
}

interface DecodeFigures {
  count: number;
  decodeNs: number[];
  patternNs: number[];
}

function measure(quick: boolean): DecodeFigures {
  const markings = generateMarkings(quick ? 20_000 : 100_000);
  const rounds = quick ? 7 : 11;
  const figures: DecodeFigures = { count: markings.length, decodeNs: [], patternNs: [] };
  for (let round = 0; round < WARM_UP_ROUNDS + rounds; round++) {
    const patternFirst = round % 2 === 1;
    const pattern = patternFirst ? patternPass(markings) : 0;
    const decode = decodePass(markings);
    const patternAfter = patternFirst ? pattern : patternPass(markings);
    if (round < WARM_UP_ROUNDS) continue;
    figures.decodeNs.push(decode);
    figures.patternNs.push(patternAfter);
  }
  return figures;
}

const perSecond = (ns: number): number => 1e9 / ns;
/** (max − min) ÷ median, in per cent. */
const spreadPct = (values: readonly number[]): number => ((Math.max(...values) - Math.min(...values)) / median(values)) * 100;

function rowsOf({ decodeNs, patternNs }: DecodeFigures): BenchRow[] {
  const rate = perSecond(median(decodeNs));
  return [
    { figure: "parseMarking, markings/s by CPU time", value: rate, unit: "/s", goal: `≥ ${GOAL_PER_SECOND.toLocaleString("en-US")}/s`, met: rate >= GOAL_PER_SECOND },
    ratioRow("parseMarking, CPU time a marking", median(decodeNs), "ns", { name: "size pattern exec", value: median(patternNs) }, MAX_RATIO),
  ];
}

export const run: Bench = async ({ quick }) => rowsOf(measure(quick));

if (isMainModule(import.meta.url)) {
  const figures = measure(false);
  const { count, decodeNs, patternNs } = figures;
  const ratios = decodeNs.map((ns, round) => ns / (patternNs[round] as number));
  const whole = (value: number) => Math.round(value).toLocaleString("en-US");
  console.log(`${count.toLocaleString("en-US")} markings, ${decodeNs.length} rounds after ${WARM_UP_ROUNDS} to warm up; CPU time of this process`);
  console.log(`parseMarking: median ${whole(perSecond(median(decodeNs)))}/s (${median(decodeNs).toFixed(0)} ns a marking); rounds ${formatRange(decodeNs.map(perSecond), whole)}/s, spread ${spreadPct(decodeNs).toFixed(0)} %`);
  console.log(`size pattern: median ${median(patternNs).toFixed(0)} ns a marking; rounds ${formatRange(patternNs, (ns) => ns.toFixed(0))} ns, spread ${spreadPct(patternNs).toFixed(0)} %`);
  console.log(`ratio round by round: ${formatRange(ratios, (ratio) => ratio.toFixed(1))} ×, median ${median(ratios).toFixed(1)} ×`);
  console.log(formatTable(rowsOf(figures)));
  if (sink < 0) console.log(sink);
}
