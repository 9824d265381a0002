/** Example markings to try: real standard sizes with invented DOT and grading lines. */
export const readerExamples = [
  "285/50R20 119S",
  "P215/65R15 95H",
  "LT265/75R16 123/120S Load Range E",
  "245/40ZR18 97Y XL",
  "33x12.50R15LT 108Q C",
  "DOT 4B7X 2HRT 1523",
  "Treadwear 500 Traction A Temperature A",
] as const;
