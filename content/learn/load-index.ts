import { LB_PER_KG, LOAD_INDEX_MAX, LOAD_INDEX_MIN, loadIndexKg, loadIndexLb, PASSENGER_TIRE_ON_TRUCK_FACTOR, REFERENCE_PRESSURE } from "@/lib/tire";
import { bothPressures, loadOfIndex } from "./figures";
import { CAR_LOAD_INDEX_RANGE } from "./ranges";
import type { Lesson } from "./types";

// The load figures and the FMVSS 120 S5.1.2 divisor are read from the tire core; the dual-wheel
// reasoning and the share of the axle rating per tire are written from memory. That passenger tires
// carry no dual rating and do not belong on dual wheels is common practice.
const [carFrom, carTo] = CAR_LOAD_INDEX_RANGE;

export const loadIndexLesson: Lesson = {
  slug: "load-index",
  title: "Load index: how much one tire may carry",
  shortTitle: "Load index",
  summary: "The number in front of the speed letter is a code for the most weight a single tire is built to carry.",
  sample: "119",
  sections: [
    {
      heading: "A code, not a weight",
      paragraphs: [
        `After the size comes a short group such as 119S. The number is the load index. It is not kilograms or pounds: it is a row number in a table that every tire maker shares. Row 119 says ${loadOfIndex(119)} per tire.`,
        `The table runs from ${LOAD_INDEX_MIN} to ${LOAD_INDEX_MAX}. Each step up adds a few percent, so the numbers climb faster than they look: index ${LOAD_INDEX_MIN} is ${loadOfIndex(LOAD_INDEX_MIN)}, index 80 is ${loadOfIndex(80)}, and index 160 is ${loadOfIndex(160)}.`,
        "The load holds when the tire is inflated to the pressure it was designed around and driven no faster than its speed symbol allows. Less air, or more speed, means less it can safely carry.",
      ],
    },
    {
      heading: "Two numbers, like 123/120",
      paragraphs: [
        `Tires for vans and light trucks often show two indices. The first is for a tire running alone at the end of an axle, the second for a tire running beside a twin on a dual-wheel axle. 123 means ${loadOfIndex(123)}; 120 means ${loadOfIndex(120)} for each tire of a pair, because twins never share the weight perfectly evenly.`,
        "Passenger tires show one index only: they carry no dual rating and do not belong on dual wheels. An axle with dual wheels needs tires whose second, dual index is at least what the vehicle asks for.",
      ],
    },
    {
      heading: "Standard and Extra Load",
      paragraphs: [
        `A passenger tire's index is defined at a reference pressure: ${bothPressures(REFERENCE_PRESSURE.SL.kPa)} for a standard-load (SL) tire and ${bothPressures(REFERENCE_PRESSURE.XL.kPa)} for an Extra Load (XL) tire. An XL tire reaches its higher index only at its higher pressure.`,
        `The maximum load printed on the sidewall, next to its maximum pressure, should say the same as the index: a sidewall reading "MAX LOAD ${loadIndexKg(119)} KG (${loadIndexLb(119)} LBS)" goes with index 119.`,
      ],
    },
    {
      heading: "Choosing a replacement",
      paragraphs: [
        "Your vehicle's tire and loading placard, usually on the driver's door jamb, gives the size and the load index it was built with. A replacement must have the same index or a higher one, never lower.",
        `Each axle also has a weight rating (GAWR) on the vehicle's certification label. Each tire must carry at least half of it, or a quarter on an axle with dual wheels (using the second, dual index). A passenger-car tire fitted to a pickup, SUV, van or trailer counts for its load divided by ${PASSENGER_TIRE_ON_TRUCK_FACTOR.toFixed(2)}, so it needs more margin.`,
        `The load indices seen on cars, SUVs and light trucks mostly fall between about ${carFrom} and ${carTo}. The table below can show just those rows.`,
      ],
    },
  ],
  standards: [
    { name: "ISO 4000-1 and the ETRTO Standards Manual", covers: `the load-index table, ${LOAD_INDEX_MIN} to ${LOAD_INDEX_MAX}` },
    { name: "French Arrêté of 24 October 1994, Annex II", covers: "the published load-index table for indices 0 to 200" },
    { name: "UN Regulation No. 54, Annex 4", covers: `the load-index table as published for commercial-vehicle tires, up to ${LOAD_INDEX_MAX}` },
    { name: "FMVSS 120 (49 CFR 571.120)", covers: "tire selection: each tire carries its share of the axle rating; S5.1.2 for passenger-car tires on trucks, MPVs and trailers" },
  ],
  commonPractice: [
    `Load indices of about ${carFrom} to ${carTo} cover most cars, SUVs and light trucks (common practice).`,
    "Passenger tires carry no dual rating and do not belong on dual wheels: fit tires with a dual index there (common practice).",
    `Pounds in load tables are kilograms × ${LB_PER_KG}, rounded to the whole pound (common practice).`,
    "Drive at the pressure on the vehicle's placard, not at the maximum printed on the sidewall (common practice; the vehicle maker's figure prevails).",
  ],
  readerExample: "285/50R20 119S",
  related: ["speed-symbols", "load-range", "run-flat-and-xl"],
  table: "load-index",
  showCautions: true,
};
