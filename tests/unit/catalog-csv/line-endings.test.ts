import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { normalizeCsvText } from "@/lib/catalog-csv/line-endings";
import { readCatalogCsv } from "@/lib/catalog-csv/read-file";

// RFC 4180 (section 2): records end in CRLF, and a field in double quotes may hold commas, double
// quotes (doubled) and line breaks. Editors write LF and old Mac files a lone CR; a file touched by
// both holds a mix, which must read the same (common practice for forgiving CSV readers).
const HEADER = "sku,brand,line,size,load_index,speed_symbol,price,quantity";
const ROWS = ["QNS-T0001,Quensal,Aldermoor Tour,225/65R17,102,H,159.00,8", "VLM-T0002,Velmora,Estrelle GT,225/45R17,94,V,189.50,6"] as const;

describe("normalizeCsvText", () => {
  it("writes CRLF, LF and lone CR line endings as LF", () => {
    expect(normalizeCsvText("a,b\r\n1,2\n3,4\r5,6\r\n")).toBe("a,b\n1,2\n3,4\n5,6\n");
  });

  it("drops a UTF-8 byte-order mark", () => {
    expect(normalizeCsvText("\uFEFFa,b\r\n1,2")).toBe("a,b\n1,2");
    expect(normalizeCsvText("\uFEFFa,b\n1,2")).toBe("a,b\n1,2");
  });

  it("leaves line breaks, commas and doubled quotes inside a quoted cell as they are", () => {
    const text = 'a,b\r\n"one\r\ntwo, three",x\n"say ""hi""\r\n",y\r\n';
    expect(normalizeCsvText(text)).toBe('a,b\n"one\r\ntwo, three",x\n"say ""hi""\r\n",y\n');
  });

  it("takes a quote inside an unquoted cell for an ordinary character, as papaparse does", () => {
    expect(normalizeCsvText('a,b\r\n16" rim,2\r\n3,4\r\n')).toBe('a,b\n16" rim,2\n3,4\n');
  });

  it("keeps an unclosed quote's text, so the reader can say which line opened it", () => {
    expect(normalizeCsvText('a,b\r\n"open,2\r\n3,4')).toBe('a,b\n"open,2\r\n3,4');
  });

  it("gives papaparse the same rows for every way of ending lines", () => {
    const parse = (text: string) => Papa.parse<string[]>(normalizeCsvText(text), { delimiter: ",", newline: "\n" }).data;
    const expected = [["a", "b"], ["1", "2"], ["3", "4"]];
    for (const text of ["a,b\r\n1,2\r\n3,4", "a,b\n1,2\n3,4", "a,b\r\n1,2\n3,4", "a,b\n1,2\r\n3,4", "\uFEFFa,b\r1,2\r\n3,4"]) {
      expect(parse(text), JSON.stringify(text)).toEqual(expected);
    }
  });
});

describe("readCatalogCsv reads a file however its lines end", () => {
  const expectedSkus = ["QNS-T0001", "VLM-T0002"];
  const endings = { CRLF: "\r\n", LF: "\n", mixed: null } as const;
  for (const [name, ending] of Object.entries(endings)) {
    for (const mark of ["", "\uFEFF"]) {
      it(`${name}${mark ? " behind a byte-order mark" : ""}`, () => {
        const text = ending === null ? `${mark}${HEADER}\n${ROWS[0]}\r\n${ROWS[1]}\n` : `${mark}${[HEADER, ...ROWS].join(ending)}${ending}`;
        const read = readCatalogCsv(text);
        if (!read.ok) throw new Error(read.message);
        expect(read.refusals).toEqual([]);
        expect(read.rows.map((row) => row.item.sku)).toEqual(expectedSkus);
      });
    }
  }

  it("numbers lines as a spreadsheet does and skips comment rows", () => {
    const read = readCatalogCsv(`${HEADER}\r\n# a note for whoever edits the file\r\n${ROWS[0]}\n${ROWS[1]!.replace(",94,", ",999,")}\r\n`);
    if (!read.ok) throw new Error(read.message);
    expect(read.rowCount).toBe(2);
    expect(read.refusals.map((refusal) => [refusal.line, refusal.column])).toEqual([[4, "load_index"]]);
  });
});
