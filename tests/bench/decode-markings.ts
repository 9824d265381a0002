/**
 * Mixed sidewall markings from a fixed seed, as a person might type them: sizes in standard and
 * forgiving spellings, full sidewalls with service descriptions, DOT codes and UTQG grades, flotation
 * sizes and text that is no marking at all. The decoding bench times them; a unit test pins what the
 * decoder reads from them.
 */
import { seededRandom } from "../../lib/demo/random";

export const MARKINGS_SEED = 20_240_601;

const widths = [155, 175, 185, 195, 205, 215, 225, 235, 245, 255, 265, 275, 285, 295, 305, 315];
const aspects = [30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80];
const rims = [13, 14, 15, 16, 17, 18, 19, 20, 21, 22];
const speeds = ["Q", "R", "S", "T", "H", "V", "W", "Y", "(Y)"];
const garbage = ["hello", "asdf qwer", "tire", "1234567890", "???", "the quick brown fox", "", "   ", "R", "xl xl xl", "日本語"];

export function generateMarkings(count: number, seed = MARKINGS_SEED): string[] {
  const { next: rand, pick, int } = seededRandom(seed);

  const metric = (): string => `${pick(["", "", "P", "LT"])}${pick(widths)}/${pick(aspects)}${pick(["R", "R", "ZR", "r"])}${pick(rims)}`;

  const forgiving = (): string => {
    const [w, a, r] = [pick(widths), pick(aspects), pick(rims)];
    return pick([`${w} ${a} ${r}`, `${w}/${a}/${r}`, `${w}${a}R${r}`, `${w}-${a}R${r}`]);
  };

  const service = (): string => {
    const li = int(70, 126);
    return rand() < 0.2 ? `${li}/${li - 3}${pick(speeds)}` : `${li}${pick(speeds)}`;
  };

  const dot = (): string => {
    const week = String(int(1, 52)).padStart(2, "0");
    const year = String(int(0, 25)).padStart(2, "0");
    return pick([`DOT AB CD EFG ${week}${year}`, `DOT 4BA 1KL2 3M ${week}${year}`, `dot XX ${week}${year}`, `DOT ZZ 9${week.slice(0, 1)}${int(1, 9)}`]);
  };

  const utqg = (): string => {
    const tw = int(3, 40) * 20;
    return pick([`TREADWEAR ${tw} TRACTION A TEMPERATURE B`, `${tw} A A`, `${tw}AA A`, `UTQG ${tw} B C`]);
  };

  const sidewall = (): string => {
    const extras = [pick(["", " XL", " M+S", " 3PMSF", " LOAD RANGE E", " RF", " 10PR"]), rand() < 0.3 ? ` ${dot()}` : "", rand() < 0.2 ? ` ${utqg()}` : ""];
    return `${metric()} ${service()}${extras.join("")}`;
  };

  const flotation = (): string => `${int(28, 37)}x${pick(["10.50", "11.50", "12.50"])}R${pick([15, 17, 20])}LT ${service()}`;
  const makers = [metric, metric, forgiving, sidewall, sidewall, sidewall, dot, utqg, () => pick(garbage), flotation];
  return Array.from({ length: count }, () => pick(makers)());
}
