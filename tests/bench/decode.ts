/**
 * Decoding throughput: builds 100,000 mixed markings from a fixed seed, warms up, then decodes them all.
 * Run with `npm run bench:decode`.
 */
import { parseMarking } from "../../lib/tire/index";

const COUNT = 100_000;
const RUNS = 5;

/** Small deterministic generator (mulberry32) so every run decodes the same text. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const rand = random(20_240_601);
const pick = <T>(items: readonly T[]): T => items[Math.floor(rand() * items.length)] as T;
const int = (min: number, max: number): number => min + Math.floor(rand() * (max - min + 1));

const widths = [155, 175, 185, 195, 205, 215, 225, 235, 245, 255, 265, 275, 285, 295, 305, 315];
const aspects = [30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80];
const rims = [13, 14, 15, 16, 17, 18, 19, 20, 21, 22];
const speeds = ["Q", "R", "S", "T", "H", "V", "W", "Y", "(Y)"];
const garbage = ["hello", "asdf qwer", "tire", "1234567890", "???", "the quick brown fox", "", "   ", "R", "xl xl xl", "日本語"];

function metric(): string {
  return `${pick(["", "", "P", "LT"])}${pick(widths)}/${pick(aspects)}${pick(["R", "R", "ZR", "r"])}${pick(rims)}`;
}

function forgiving(): string {
  const [w, a, r] = [pick(widths), pick(aspects), pick(rims)];
  return pick([`${w} ${a} ${r}`, `${w}/${a}/${r}`, `${w}${a}R${r}`, `${w}-${a}R${r}`]);
}

function service(): string {
  const li = int(70, 126);
  return rand() < 0.2 ? `${li}/${li - 3}${pick(speeds)}` : `${li}${pick(speeds)}`;
}

function dot(): string {
  const week = String(int(1, 52)).padStart(2, "0");
  const year = String(int(0, 25)).padStart(2, "0");
  return pick([`DOT AB CD EFG ${week}${year}`, `DOT 4BA 1KL2 3M ${week}${year}`, `dot XX ${week}${year}`, `DOT ZZ 9${week.slice(0, 1)}${int(1, 9)}`]);
}

function utqg(): string {
  const tw = int(3, 40) * 20;
  return pick([`TREADWEAR ${tw} TRACTION A TEMPERATURE B`, `${tw} A A`, `${tw}AA A`, `UTQG ${tw} B C`]);
}

function sidewall(): string {
  const extras = [pick(["", " XL", " M+S", " 3PMSF", " LOAD RANGE E", " RF", " 10PR"]), rand() < 0.3 ? ` ${dot()}` : "", rand() < 0.2 ? ` ${utqg()}` : ""];
  return `${metric()} ${service()}${extras.join("")}`;
}

const makers = [metric, metric, forgiving, sidewall, sidewall, sidewall, dot, utqg, () => pick(garbage), () => `${int(28, 37)}x${pick(["10.50", "11.50", "12.50"])}R${pick([15, 17, 20])}LT ${service()}`];
const markings = Array.from({ length: COUNT }, () => pick(makers)());

let sink = 0;
const decodeAll = (): void => {
  for (const m of markings) sink += parseMarking(m).ok ? 1 : 0;
};

for (let i = 0; i < 3; i++) decodeAll();
const times: number[] = [];
const cpuStart = process.cpuUsage();
for (let i = 0; i < RUNS; i++) {
  const start = performance.now();
  decodeAll();
  times.push(performance.now() - start);
}
const cpu = process.cpuUsage(cpuStart);
const cpuMsPerRun = (cpu.user + cpu.system) / 1000 / RUNS;
times.sort((a, b) => a - b);
const median = times[Math.floor(RUNS / 2)] as number;
const perSecond = Math.round((COUNT / median) * 1000);
console.log(`decoded ${COUNT.toLocaleString("en-US")} markings in ${median.toFixed(1)} ms (median of ${RUNS} runs)`);
console.log(`${perSecond.toLocaleString("en-US")} markings/second (target 500,000)`);
console.log(`runs (ms): ${times.map((t) => t.toFixed(1)).join(", ")}; CPU time per run ${cpuMsPerRun.toFixed(1)} ms`);
if (sink < 0) console.log(sink);
