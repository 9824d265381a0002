import type { Lesson } from "./types";

// What M+S declares, the snow traction test behind the three-peak symbol and the separate ice-grip
// symbol (ISO 19447) are written from memory of UN Regulation No. 117 and ASTM F1805.
export const winterMarksLesson: Lesson = {
  slug: "winter-marks",
  title: "Winter marks: M+S and the three-peak mountain snowflake",
  shortTitle: "Winter marks",
  summary: "M+S describes a tread pattern; the mountain with a snowflake shows the tire passed a snow traction test.",
  sample: "M+S 3PMSF",
  sections: [
    {
      heading: "M+S: a tread made for mud and snow",
      paragraphs: [
        "M+S, also written M&S, M/S or MS, is the maker's statement that the tread pattern was designed for mud and fresh or melting snow: wider grooves and more edges than a summer tread.",
        "No snow test stands behind M+S alone. Many all-season tires carry it, and some grip snow far better than others.",
      ],
    },
    {
      heading: "The three-peak mountain snowflake (3PMSF)",
      paragraphs: [
        "The symbol of a mountain with three peaks and a snowflake inside means the tire was tested on packed snow against a standard reference tire and did clearly better than it. That makes 3PMSF the mark to look for when snow grip matters.",
        "Winter tires carry it, and so do many all-weather tires, which are made to be used all year.",
      ],
    },
    {
      heading: "Ice is a different matter",
      paragraphs: [
        "Neither mark promises grip on ice. Some tires sold in Europe carry a separate ice-grip symbol after their own test. On glazed roads, studs or chains may be the only real help where they are allowed.",
      ],
    },
    {
      heading: "Where rules apply",
      paragraphs: [
        "Some countries, provinces and mountain roads require winter tires for part of the year, and some accept only tires with the three-peak symbol. Others allow winter tires a lower speed symbol than the vehicle needs. Check the rules where you drive.",
        "A winter tire is still a replacement like any other: same rim diameter, a load index and a speed symbol that meet the vehicle's placard unless a local rule says otherwise.",
      ],
    },
  ],
  standards: [
    { name: "UN Regulation No. 117", covers: "the snow performance test behind the three-peak mountain snowflake" },
    { name: "ASTM F1805", covers: "the test method for tire traction on packed snow" },
  ],
  commonPractice: [
    "Fit winter tires on all four wheels, never on one axle only (common practice).",
    "Winter compounds are soft and wear quickly in summer heat; swap back when the cold season ends (common practice).",
  ],
  readerExample: "225/65R17 102H M+S 3PMSF",
  related: ["speed-symbols", "utqg", "load-index"],
  showCautions: true,
};
